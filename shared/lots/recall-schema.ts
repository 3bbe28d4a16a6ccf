// A recall a veterinarian places: a lot number (any letter case), optionally one product, and the reason.
import { z } from 'zod';

export const recallSchema = z.object({
  lotNumber: z.string().trim().min(1, 'Give the lot number.').max(60, 'At most 60 characters.'),
  productId: z.number().int().positive().nullable().default(null),
  reason: z.string().trim().min(1, 'Say why (for example the manufacturer\'s notice).').max(2000, 'At most 2,000 characters.'),
});

export type RecallInput = z.infer<typeof recallSchema>;
