// Bird-number updates: losses since the last update (mortality, culls) or a headcount that sets the number.
import { z } from 'zod';
import { birdCountKinds, type BirdCountKind } from './bird-count-kinds.js';
import { isoDateField } from './iso-date-field.js';

export const birdCountInputSchema = z
  .object({
    countedOn: isoDateField(),
    kind: z.enum(birdCountKinds, { message: 'Choose mortality or headcount.' }),
    birds: z.number({ message: 'Enter a number of birds.' }).int('Whole birds.').min(0, 'Not negative.').max(10_000_000, 'At most 10,000,000 birds.'),
    note: z.string().trim().max(500, 'At most 500 characters.').default(''),
  })
  .refine((c) => c.kind === 'count' || c.birds > 0, { path: ['birds'], message: 'Enter the birds lost (at least 1).' });

export type BirdCountInput = z.infer<typeof birdCountInputSchema>;

export interface BirdCountView {
  id: number;
  countedOn: string;
  kind: BirdCountKind;
  birds: number;
  /** Birds in the flock after this update. */
  birdsAfter: number;
  note: string;
  recordedBy: string | null;
  recordedAt: string;
}
