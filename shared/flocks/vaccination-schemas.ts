// Vaccinations of a flock: planned (from its programme or by hand), confirmed, done; moved by hand; the withdrawal override.
import { z } from 'zod';
import { productRoutes, type ProductRoute } from '../catalogue/product-kinds.js';
import { isoDateField } from './iso-date-field.js';
import type { VaccinationStatus } from './vaccination-statuses.js';

export const vaccinationInputSchema = z.object({
  productId: z.number({ message: 'Choose a product.' }).int().positive('Choose a product.'),
  plannedDate: isoDateField(),
  route: z.enum(productRoutes, { message: 'Choose a route.' }),
  notes: z.string().trim().max(500, 'At most 500 characters.').default(''),
});

export type VaccinationInput = z.infer<typeof vaccinationInputSchema>;

/** Moving a vaccination by hand, or changing its notes; a moved confirmed vaccination goes back to planned. */
export const vaccinationChangeSchema = z
  .object({
    plannedDate: isoDateField().optional(),
    notes: z.string().trim().max(500, 'At most 500 characters.').optional(),
  })
  .refine((c) => c.plannedDate !== undefined || c.notes !== undefined, { path: ['plannedDate'], message: 'Enter a new date.' });

export type VaccinationChange = z.infer<typeof vaccinationChangeSchema>;

export const vaccinationCancelSchema = z.object({
  reason: z.string().trim().min(1, 'Say why it is cancelled.').max(500, 'At most 500 characters.'),
});

export const withdrawalOverrideSchema = z.object({
  reason: z
    .string({ message: 'Give the reason for the override.' })
    .trim()
    .min(10, 'Give the reason in a sentence (at least 10 characters).')
    .max(2000, 'At most 2000 characters.'),
});

export const vaccinationListQuerySchema = z.object({
  siteId: z.coerce.number().int().positive().optional(),
  from: isoDateField().optional(),
  to: isoDateField().optional(),
});

export interface WithdrawalOverrideView {
  id: number;
  reason: string;
  decidedBy: string;
  decidedAt: string;
  vaccinationDate: string;
  depletionDate: string;
  withdrawalDays: number;
  /** False once the vaccination or the depletion moved: the veterinarian must look again. */
  applies: boolean;
}

export interface WithdrawalView {
  /** Inside the product's withdrawal days before planned depletion. */
  flagged: boolean;
  withdrawalDays: number;
  /** Whole days from the vaccination to planned depletion; null without a depletion date. */
  daysBeforeDepletion: number | null;
  /** Flagged, and a veterinarian's override covers this date, depletion and label. */
  overridden: boolean;
  /** Flagged and no override applies: cannot be confirmed. */
  blocksConfirmation: boolean;
}

export interface VaccinationView {
  id: number;
  flockId: number;
  flockName: string;
  siteId: number;
  houseName: string;
  productId: number;
  productName: string;
  route: ProductRoute;
  plannedDate: string;
  /** The flock's age on the planned date, in days. */
  ageDays: number;
  status: VaccinationStatus;
  /** The programme step it was generated from; null when added by hand (or its step was dropped). */
  programmeStepId: number | null;
  fromProgramme: boolean;
  movedByHand: boolean;
  notes: string;
  confirmedBy: string | null;
  confirmedAt: string | null;
  cancelReason: string | null;
  withdrawal: WithdrawalView;
  overrides: WithdrawalOverrideView[];
}
