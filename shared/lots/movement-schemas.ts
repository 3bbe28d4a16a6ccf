// The forms storage staff fill to move vials between fridges or discard them (used by the API and typed by the client).
import { z } from 'zod';
import { discardReasons } from './discard-reasons.js';

const instant = (what: string) => z.iso.datetime({ offset: true, message: `Enter ${what} as a date and time.` });
const fridgeId = z.number({ message: 'Choose a fridge.' }).int().positive('Choose a fridge.');
const vials = z.number({ message: 'Enter whole vials.' }).int('Whole vials.').min(1, 'At least 1 vial.').max(100_000, 'At most 100,000 vials.');

export const transferSchema = z
  .object({
    fromFridgeId: fridgeId,
    toFridgeId: fridgeId,
    vials,
    leftAt: instant('when the vials left the fridge'),
    at: instant('when the vials arrived'),
    plannedTransferId: z.number().int().positive().nullable().default(null),
    notes: z.string().trim().max(500, 'At most 500 characters.').default(''),
  })
  .refine((value) => value.fromFridgeId !== value.toFridgeId, { path: ['toFridgeId'], message: 'Choose another fridge than the one the vials leave.' })
  .refine((value) => Date.parse(value.at) >= Date.parse(value.leftAt), { path: ['at'], message: 'The vials cannot arrive before they left.' });
export type TransferInput = z.infer<typeof transferSchema>;

export const discardSchema = z
  .object({
    fridgeId,
    vials,
    reason: z.enum(discardReasons, { message: 'Choose a reason.' }),
    reasonText: z.string().trim().max(500, 'At most 500 characters.').default(''),
  })
  .refine((value) => value.reason !== 'other' || value.reasonText.length > 0, { path: ['reasonText'], message: 'Say why the vials are discarded.' });
export type DiscardInput = z.infer<typeof discardSchema>;
