// Purchasing's inputs: per-product stock settings, the safety-stock proposal request, planned transfers.
import { z } from 'zod';
import { isoDateField } from '../flocks/iso-date-field.js';

export const safetyStockKinds = ['doses', 'days'] as const;
export type SafetyStockKind = (typeof safetyStockKinds)[number];

export const productStockSettingsSchema = z
  .object({
    safetyStockKind: z.enum(safetyStockKinds, { message: 'Choose doses or days of cover.' }),
    safetyStockValue: z.number({ message: 'Enter a number.' }).min(0, 'Not negative.').max(10_000_000, 'At most 10,000,000.'),
    supplierId: z.number().int().positive().nullable().default(null),
    presentationId: z.number().int().positive().nullable().default(null),
    /** Kept when the value came from a proposal, so the screen can say which service level it stands for. */
    serviceLevel: z.number().gt(0).lt(1).nullable().default(null),
  })
  .refine((s) => s.safetyStockKind === 'doses' || s.safetyStockValue <= 365, { path: ['safetyStockValue'], message: 'At most 365 days of cover.' })
  .refine((s) => s.safetyStockKind === 'days' || Number.isInteger(s.safetyStockValue), { path: ['safetyStockValue'], message: 'Whole doses.' });

export type ProductStockSettingsInput = z.infer<typeof productStockSettingsSchema>;

export const safetyProposalRequestSchema = z.object({
  serviceLevel: z.number({ message: 'Choose a service level.' }).min(0.5, 'At least 50 %.').max(0.999, 'At most 99.9 %.'),
});

export const plannedTransferInputSchema = z.object({
  lotId: z.number({ message: 'Choose a lot.' }).int().positive('Choose a lot.'),
  fromSiteId: z.number({ message: 'Choose the site to take from.' }).int().positive('Choose the site to take from.'),
  vials: z.number({ message: 'Enter the vials.' }).int('Whole vials.').min(1, 'At least 1 vial.').max(100_000, 'At most 100,000 vials.'),
  plannedOn: isoDateField(),
  notes: z.string().trim().max(500, 'At most 500 characters.').default(''),
});

export type PlannedTransferInput = z.infer<typeof plannedTransferInputSchema>;

export interface ProductStockSettingsView {
  siteId: number;
  productId: number;
  productName: string;
  safetyStockKind: SafetyStockKind;
  safetyStockValue: number;
  supplierId: number | null;
  presentationId: number | null;
  serviceLevel: number | null;
  /** False while the product still runs on the defaults (no safety stock, supplier from past orders). */
  saved: boolean;
}

export interface PlannedTransferView {
  id: number;
  lotId: number;
  lotNumber: string;
  productId: number;
  productName: string;
  fromSiteId: number;
  fromSiteName: string;
  toSiteId: number;
  toSiteName: string;
  vials: number;
  plannedOn: string;
  status: 'planned' | 'done' | 'cancelled';
  notes: string;
}
