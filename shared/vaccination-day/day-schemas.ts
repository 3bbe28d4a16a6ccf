// Input shapes of the vaccination day (crews, checks, trials, water volumes, vials out and back, the record), checked at the API's edge.
import { z } from 'zod';
import { isoDateField } from '../flocks/iso-date-field.js';
import { memberCheckKinds, vaccinationCheckKinds } from './readiness-kinds.js';

const id = (message: string) => z.number({ message }).int(message).positive(message);
const instant = z.iso.datetime({ offset: true, message: 'Give a date and time.' });

export const crewAssignmentSchema = z.object({
  siteId: id('Choose a site.'),
  day: isoDateField(),
  leadId: id('Choose the crew lead.'),
  memberIds: z.array(id('Choose a crew member.')).max(30, 'At most 30 crew members.').default([]),
});
export type CrewAssignmentInput = z.infer<typeof crewAssignmentSchema>;

export const daySheetQuerySchema = z.object({
  day: isoDateField(),
  leadId: z.coerce.number().int().positive().optional(),
});

/** A site's crew on a day; without a day, the site's today. */
export const crewQuerySchema = z.object({ day: isoDateField().optional() });

const answers = z.object({
  visits: z
    .array(z.object({ siteId: z.number().int().positive().nullable(), at: instant, label: z.string().trim().max(120).optional() }))
    .max(50)
    .optional(),
  expectedTemperature: z.object({ value: z.number().min(-60).max(140), unit: z.enum(['F', 'C']) }).optional(),
}).catchall(z.boolean());

export const memberCheckSchema = z.object({
  day: isoDateField(),
  memberId: id('Choose the crew member.'),
  kind: z.enum(memberCheckKinds, { message: 'Choose a check.' }),
  /** Planned start of the first visit, for the 12-hour rule. */
  firstVisitAt: instant.optional(),
  answers: answers.default({}),
  note: z.string().trim().max(1000).default(''),
});
export type MemberCheckInput = z.infer<typeof memberCheckSchema>;

export const vaccinationCheckSchema = z.object({
  kind: z.enum(vaccinationCheckKinds, { message: 'Choose a check.' }),
  answers: answers.default({}),
  note: z.string().trim().max(1000).default(''),
});
export type VaccinationCheckInput = z.infer<typeof vaccinationCheckSchema>;

export const checkOverrideSchema = z.object({
  reason: z.string({ message: 'Give the reason.' }).trim().min(10, 'Give the reason in a sentence (at least 10 characters).').max(2000),
});

export const sprayerTrialSchema = z.object({
  result: z.enum(['acceptable', 'adjusted_retested'], { message: 'Choose the result.' }),
  nozzleHeightCm: z.number({ message: 'Enter the nozzle height.' }).positive('Enter the nozzle height.').max(500),
  walkingPaceMPerMin: z.number({ message: 'Enter the walking pace.' }).positive('Enter the walking pace.').max(200),
  notes: z.string().trim().max(1000).default(''),
});
export type SprayerTrialInput = z.infer<typeof sprayerTrialSchema>;

export const waterVolumeSchema = z
  .object({
    productId: id('Choose a product.'),
    ageFromDays: z.number().int().min(0, 'At least 0 days.'),
    ageToDays: z.number().int().max(1050, 'At most 1,050 days.'),
    mlPer1000Birds: z.number({ message: 'Enter mL per 1,000 birds.' }).positive('Enter mL per 1,000 birds.').max(100000),
    source: z.enum(['label', 'veterinarian'], { message: 'Say where the volume comes from.' }),
    note: z.string().trim().max(500).default(''),
  })
  .refine((v) => v.ageToDays >= v.ageFromDays, { path: ['ageToDays'], message: 'Must not be before the first age.' });
export type WaterVolumeInput = z.infer<typeof waterVolumeSchema>;

export const issueSchema = z
  .object({
    barcode: z.string().trim().max(300).optional(),
    lotNumber: z.string().trim().max(60).optional(),
    fridgeId: id('Choose the fridge.').optional(),
    vials: z.number({ message: 'Enter the vials.' }).int('Whole vials.').min(1, 'At least 1 vial.').max(10000),
  })
  .refine((v) => Boolean(v.barcode) || Boolean(v.lotNumber), { path: ['barcode'], message: 'Scan the barcode or type the lot number.' });
export type IssueInput = z.infer<typeof issueSchema>;

export const returnSchema = z.object({
  lotId: id('Choose the lot.'),
  vials: z.number({ message: 'Enter the vials.' }).int('Whole vials.').min(1, 'At least 1 vial.').max(10000),
  toFridgeId: id('Choose the fridge.').optional(),
  /** Opened vials are used, never returned: the crew confirms these are unopened. */
  unopened: z.literal(true, { message: 'Only unopened vials go back.' }),
  at: instant.optional(),
});
export type ReturnInput = z.infer<typeof returnSchema>;

export const cleaningItems = {
  disassembled: 'Sprayer taken apart',
  washed: 'Washed with mild detergent and water, no disinfectant',
  tankDried: 'Tank dried',
  batteryRecharging: 'Battery on charge',
} as const;

export const recordSchema = z.object({
  endedAt: instant.optional(),
  birdsVaccinated: z.number({ message: 'Enter the birds vaccinated.' }).int().min(0).max(10_000_000),
  deviations: z.string().trim().max(4000).default(''),
  /** The sprayer's cleaning steps: asked of a spray vaccination only (the service checks the route). */
  cleaning: z.object({ disassembled: z.boolean(), washed: z.boolean(), tankDried: z.boolean(), batteryRecharging: z.boolean() }).optional(),
  lots: z.array(z.object({ lotId: id('Choose the lot.'), vialsUsed: z.number().int().min(0).max(10000) })).max(50),
  password: z.string({ message: 'Enter your password to sign.' }).min(1, 'Enter your password to sign.').max(1024),
});
export type RecordInput = z.infer<typeof recordSchema>;
