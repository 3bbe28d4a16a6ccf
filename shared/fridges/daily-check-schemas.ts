// A daily temperature check of a fridge: the quick form's rules and the record it becomes.
import { z } from 'zod';

const temperature = z.number({ message: 'Enter a temperature.' }).min(-100, 'At least −100.').max(200, 'At most 200.');

export const dailyCheckInputSchema = z
  .object({
    fridgeId: z.number().int().positive(),
    /** ISO 8601 with an offset; defaults to now. */
    checkedAt: z.string().datetime({ offset: true, message: 'A date and time with its offset.' }).optional(),
    unit: z.enum(['F', 'C']),
    current: temperature,
    /** Minimum and maximum since the display was last reset; only where the fridge has such a display. */
    min: temperature.nullable().default(null),
    max: temperature.nullable().default(null),
    initials: z.string().trim().toUpperCase().regex(/^[A-Z]{1,4}$/, '1–4 letters.'),
    note: z.string().trim().max(500, 'At most 500 characters.').default(''),
  })
  .refine((c) => c.min === null || c.max === null || c.min <= c.max, { path: ['max'], message: 'The maximum cannot be below the minimum.' })
  .refine((c) => c.min === null || c.min <= c.current, { path: ['min'], message: 'The minimum cannot be above the current temperature.' })
  .refine((c) => c.max === null || c.max >= c.current, { path: ['max'], message: 'The maximum cannot be below the current temperature.' });

export type DailyCheckInput = z.infer<typeof dailyCheckInputSchema>;

export interface DailyCheckView {
  id: number;
  fridgeId: number;
  checkedAt: string;
  currentC: number;
  minC: number | null;
  maxC: number | null;
  enteredUnit: 'F' | 'C';
  initials: string;
  note: string;
  recordedBy: string;
  /** Whether any of the three values lies outside the fridge's alarm range. */
  outOfRange: boolean;
  excursionId: number | null;
}
