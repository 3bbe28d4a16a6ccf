// Suppliers: who vaccines are ordered from, where the order mail goes, and how long a delivery takes.
import { z } from 'zod';

export const supplierInputSchema = z.object({
  name: z.string().trim().min(1, 'Enter a name.').max(120, 'At most 120 characters.'),
  orderEmail: z.string().trim().toLowerCase().max(254, 'At most 254 characters.').email('Enter an e-mail address.'),
  leadTimeDays: z.number({ message: 'Enter a number of days.' }).int('Whole days.').min(0, 'Not negative.').max(365, 'At most 365 days.').default(7),
  notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
});

export type SupplierInput = z.infer<typeof supplierInputSchema>;

export interface SupplierView {
  id: number;
  name: string;
  orderEmail: string;
  leadTimeDays: number;
  notes: string;
}
