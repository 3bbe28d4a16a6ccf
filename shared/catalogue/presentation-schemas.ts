// A product's packs: doses per vial, vials per pack, the pack's and the single vial's GTIN, and the price.
import { z } from 'zod';
import { gtinField, optionalGtinField } from './gtin-field.js';

const presentationFields = {
  dosesPerVial: z.number({ message: 'Enter the doses per vial.' }).int('Whole doses.').min(1, 'At least 1 dose.').max(1_000_000, 'At most 1,000,000 doses.'),
  /** Vials come 10 to a pack in this trade (common practice); other packs exist. */
  vialsPerPack: z.number({ message: 'Enter the vials per pack.' }).int('Whole vials.').min(1, 'At least 1 vial.').max(1000, 'At most 1000 vials.').default(10),
};

function distinctGtins(p: { packGtin: string | null; vialGtin: string | null }): boolean {
  return !p.packGtin || !p.vialGtin || p.packGtin !== p.vialGtin;
}

export const presentationInputSchema = z
  .object({
    ...presentationFields,
    packGtin: optionalGtinField,
    vialGtin: optionalGtinField,
    unitPrice: z.number().min(0, 'Not negative.').max(1_000_000, 'Too high.').nullable().default(null),
  })
  .refine(distinctGtins, { path: ['vialGtin'], message: 'Leave the vial GTIN empty when it is the same as the pack GTIN.' });

export type PresentationInput = z.infer<typeof presentationInputSchema>;

/**
 * An unknown GTIN met at receiving becomes a proposed presentation at once: of a product already in the
 * catalogue, or of a new proposed product named by the clerk. Purchasing or an admin confirms it later.
 */
export const presentationProposalSchema = z
  .object({
    gtin: gtinField,
    gtinLevel: z.enum(['pack', 'vial']).default('pack'),
    productId: z.number().int().positive().nullable().default(null),
    productName: z.string().trim().max(120, 'At most 120 characters.').default(''),
    ...presentationFields,
  })
  .refine((p) => p.productId !== null || p.productName.length > 0, { path: ['productName'], message: 'Choose a product or type the name on the label.' });

export type PresentationProposal = z.infer<typeof presentationProposalSchema>;

export interface PresentationView {
  id: number;
  productId: number;
  dosesPerVial: number;
  vialsPerPack: number;
  packGtin: string | null;
  vialGtin: string | null;
  unitPrice: number | null;
  status: 'confirmed' | 'proposed';
  proposedBy: string | null;
}
