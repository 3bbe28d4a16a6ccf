// Vaccination programmes: reusable lists of steps (product, age in days or weeks, route, notes) chosen per flock.
import { z } from 'zod';
import { productRoutes, type ProductRoute } from '../catalogue/product-kinds.js';
import { ageUnits, type AgeUnit } from './age-units.js';

// Layer flocks are kept up to about 100 weeks; 150 weeks leaves room without letting a typo through.
const MAX_AGE_DAYS = 150 * 7;

export const programmeStepInputSchema = z
  .object({
    /** Present when an existing step is kept (vaccinations already generated from it stay linked). */
    id: z.number().int().positive().optional(),
    productId: z.number({ message: 'Choose a product.' }).int().positive('Choose a product.'),
    ageValue: z.number({ message: 'Enter the age.' }).int('Whole days or weeks.').min(0, 'Not negative.'),
    ageUnit: z.enum(ageUnits, { message: 'Choose days or weeks.' }),
    route: z.enum(productRoutes, { message: 'Choose a route.' }),
    notes: z.string().trim().max(500, 'At most 500 characters.').default(''),
  })
  .refine((s) => (s.ageUnit === 'weeks' ? s.ageValue * 7 : s.ageValue) <= MAX_AGE_DAYS, {
    path: ['ageValue'],
    message: 'At most 150 weeks (1,050 days).',
  });

export const programmeInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name.').max(120, 'At most 120 characters.'),
    notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
    active: z.boolean().default(true),
    steps: z.array(programmeStepInputSchema).min(1, 'Add at least one step.').max(60, 'At most 60 steps.'),
  })
  .superRefine((p, ctx) => {
    const seen = new Set<number>();
    p.steps.forEach((step, i) => {
      if (step.id === undefined) return;
      if (seen.has(step.id)) ctx.addIssue({ code: 'custom', path: ['steps', i, 'id'], message: 'This step appears twice.' });
      seen.add(step.id);
    });
  });

export type ProgrammeInput = z.infer<typeof programmeInputSchema>;
export type ProgrammeStepInput = z.infer<typeof programmeStepInputSchema>;

export interface ProgrammeStepView {
  id: number;
  position: number;
  productId: number;
  productName: string;
  ageValue: number;
  ageUnit: AgeUnit;
  ageDays: number;
  route: ProductRoute;
  notes: string;
}

export interface ProgrammeView {
  id: number;
  name: string;
  notes: string;
  active: boolean;
  steps: ProgrammeStepView[];
  /** Flocks (not depleted) following it. */
  flockCount: number;
}
