// The plan input file's shape, so the planner only ever sees well-formed lots and vaccinations.
import { z } from 'zod';
import { isIsoDate } from './iso-date.js';
import { formatIssuePath } from './issue-path.js';
import { isYearMonth, normalizeExpiry } from './month-end-expiry.js';

// Bounds keep every dose total a safe integer; they sit far above any farm's numbers.
const MAX_DOSES_PER_VIAL = 1_000_000;
const MAX_VIALS_PER_LOT = 1_000_000;
const MAX_BIRDS = 100_000_000;
const MAX_OVERAGE_PERCENT = 100;

const entityId = z.union([z.string().min(1), z.number()], { error: 'must be a non-empty string or a number' });
const isoDate = z.string().refine(isIsoDate, { error: 'must be a calendar date written YYYY-MM-DD' });
const expiry = z
  .string()
  .refine((text) => isIsoDate(text) || isYearMonth(text), { error: 'must be a calendar date YYYY-MM-DD (or YYYY-MM for month end)' })
  .transform(normalizeExpiry);

const lot = z.object({
  id: entityId,
  product: z.string().min(1),
  dosesPerVial: z.number().int().min(1).max(MAX_DOSES_PER_VIAL),
  vials: z.number().int().min(0).max(MAX_VIALS_PER_LOT),
  expiry,
  status: z.enum(['usable', 'hold', 'discarded']),
});

const vaccination = z.object({
  id: entityId,
  product: z.string().min(1),
  date: isoDate,
  birds: z.number().int().min(0).max(MAX_BIRDS),
});

export const planInputSchema = z
  .object({
    lots: z.array(lot),
    vaccinations: z.array(vaccination),
    overagePercent: z
      .number()
      .min(0)
      .max(MAX_OVERAGE_PERCENT)
      .refine((percent) => Math.abs(percent * 100 - Math.round(percent * 100)) <= 1e-6, { error: 'allows at most two decimals' })
      .default(0),
  })
  .superRefine((input, ctx) => {
    reportDuplicates(input.lots, 'lots', ctx);
    reportDuplicates(input.vaccinations, 'vaccinations', ctx);
  });

export type PlanInput = z.infer<typeof planInputSchema>;

export type ParsedPlanInput = { ok: true; input: PlanInput } | { ok: false; errors: string[] };

/** Each error reads "path: reason", e.g. "lots[2].expiry: must be a calendar date written YYYY-MM-DD". */
export function parsePlanInput(raw: unknown): ParsedPlanInput {
  const result = planInputSchema.safeParse(raw);
  if (result.success) return { ok: true, input: result.data };
  return { ok: false, errors: result.error.issues.map((issue) => `${formatIssuePath(issue.path)}: ${issue.message}`) };
}

function reportDuplicates(items: readonly { id: string | number }[], field: string, ctx: z.RefinementCtx): void {
  const seen = new Set<string | number>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) ctx.addIssue({ code: 'custom', path: [field, i, 'id'], message: `duplicate id ${JSON.stringify(item.id)}` });
    seen.add(item.id);
  });
}
