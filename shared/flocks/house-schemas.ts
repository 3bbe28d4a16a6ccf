// Houses: the buildings of a site where flocks are placed, and how the birds are kept in them.
import { z } from 'zod';
import { housings, type Housing } from './housings.js';

export const houseInputSchema = z.object({
  name: z.string().trim().min(1, 'Enter a name.').max(60, 'At most 60 characters.'),
  housing: z.enum(housings, { message: 'Choose cage, aviary or floor.' }),
  /** Birds the house is built for; a hint beside the flock form, never a block. */
  capacity: z.number().int('Whole birds.').min(1, 'At least 1 bird.').max(10_000_000, 'At most 10,000,000 birds.').nullable().default(null),
  active: z.boolean().default(true),
});

export type HouseInput = z.infer<typeof houseInputSchema>;

export interface HouseView {
  id: number;
  siteId: number;
  name: string;
  housing: Housing;
  capacity: number | null;
  active: boolean;
  /** The flock in the house today, if any. */
  currentFlock: { id: number; name: string } | null;
}
