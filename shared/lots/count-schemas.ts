// The stock count a counter submits for one fridge (used by the API and typed by the client).
import { z } from 'zod';

const vialCount = z.number({ message: 'Enter whole vials.' }).int('Whole vials.').min(0, 'Not negative.').max(100_000, 'At most 100,000 vials.');

export const countLineSchema = z.object({
  lotId: z.number().int().positive(),
  expected: vialCount,
  counted: vialCount,
  reason: z.string().trim().max(500, 'At most 500 characters.').default(''),
});

export const stockCountSchema = z.object({
  lines: z.array(countLineSchema).max(1000, 'At most 1,000 lots on one sheet.'),
  notes: z.string().trim().max(1000, 'At most 1,000 characters.').default(''),
});
export type StockCountInput = z.infer<typeof stockCountSchema>;
