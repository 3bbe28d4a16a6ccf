// What the receiving form sends: the shipment, its checks and reading, and one line per lot; shared with the client's form.
import { z } from 'zod';
import { indicatorStates, outcomes, readingPlaces } from './arrival-checks.js';
import { readExpiry } from './expiry-input.js';

const id = z.number({ message: 'Choose one.' }).int().positive();
const count = (what: string) =>
  z.number({ message: `Enter the number of ${what} vials.` }).int('Whole vials only.').min(0, 'Cannot be negative.').max(100_000, 'Too many vials.');
const instant = z.iso.datetime({ offset: true, message: 'Enter a date and time.' });
const answered = (message: string) => z.boolean({ message });

export const shipmentLineSchema = z.object({
  presentationId: id,
  /** The barcode data as scanned, kept for the record (empty when typed). */
  scan: z.string().max(200, 'At most 200 characters.').default(''),
  /** GS1 (10) allows up to 20 characters. */
  lotNumber: z.string().trim().min(1, 'Enter the lot number.').max(20, 'A lot number has at most 20 characters.'),
  expiry: z
    .string({ message: 'Enter the expiry.' })
    .transform((text, context) => {
      const expiry = readExpiry(text);
      if (!expiry) {
        context.addIssue({ code: 'custom', message: 'Enter the expiry as YYYY-MM-DD, or YYYY-MM when the label gives only month and year.' });
        return z.NEVER;
      }
      return expiry;
    }),
  vialsExpected: count('expected'),
  vialsIntact: count('intact'),
  vialsBroken: count('broken or damaged'),
  vialsMissing: count('missing'),
  accepted: z.boolean().default(true),
  fridgeId: id.nullable().default(null),
  storedAt: instant.nullable().default(null),
  notes: z.string().trim().max(500, 'At most 500 characters.').default(''),
});

export const shipmentReadingSchema = z.object({
  value: z.number({ message: 'Enter the temperature read.' }).min(-60, 'Too low for a reading.').max(140, 'Too high for a reading.'),
  unit: z.enum(['F', 'C'], { message: 'Choose °F or °C.' }),
  place: z.enum(readingPlaces, { message: 'Say where the reading was taken.' }),
});

export const shipmentInputSchema = z
  .object({
    /** Made by the form once per draft: sending the same draft twice records one shipment. */
    clientKey: z.uuid({ message: 'Missing draft key.' }),
    purchaseOrderId: id.nullable().default(null),
    supplierId: id.nullable().default(null),
    carrier: z.string().trim().max(80, 'At most 80 characters.').default(''),
    trackingNumber: z.string().trim().max(80, 'At most 80 characters.').default(''),
    arrivedAt: instant,
    shippedAt: instant.nullable().default(null),
    checks: z.object({
      containerIntact: answered('Say whether the outer container is intact.'),
      coolantPresent: answered('Say whether coolant is present.'),
      indicator: z.enum(indicatorStates, { message: 'Say what the temperature indicator shows.' }),
      contentsCold: answered('Say whether the contents are cold.'),
    }),
    reading: shipmentReadingSchema.nullable().default(null),
    outcome: z.enum(outcomes, { message: 'Choose accepted, accepted with discrepancies, or refused.' }),
    notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
    lines: z.array(shipmentLineSchema).max(100, 'At most 100 lines.'),
  })
  .superRefine((shipment, context) => {
    const arrived = Date.parse(shipment.arrivedAt);
    // A phone's clock may run a little ahead; an hour is plainly a mistake.
    if (arrived > Date.now() + 5 * 60_000) context.addIssue({ code: 'custom', path: ['arrivedAt'], message: 'The arrival time is in the future.' });
    if (shipment.shippedAt && Date.parse(shipment.shippedAt) > arrived) {
      context.addIssue({ code: 'custom', path: ['shippedAt'], message: 'Shipped after it arrived? Check the shipping time.' });
    }
    if (shipment.outcome !== 'refused' && shipment.lines.length === 0) {
      context.addIssue({ code: 'custom', path: ['lines'], message: 'Add at least one lot, or refuse the shipment.' });
    }
    shipment.lines.forEach((line, index) => {
      const takesStock = shipment.outcome !== 'refused' && line.accepted && line.vialsIntact > 0;
      if (takesStock && line.fridgeId === null) {
        context.addIssue({ code: 'custom', path: ['lines', index, 'fridgeId'], message: 'Choose the fridge this lot went into.' });
      }
      if (line.storedAt && Date.parse(line.storedAt) < arrived) {
        context.addIssue({ code: 'custom', path: ['lines', index, 'storedAt'], message: 'Stored before it arrived? Check the time.' });
      }
    });
  });

export type ShipmentInput = z.infer<typeof shipmentInputSchema>;
export type ShipmentLineInput = z.infer<typeof shipmentLineSchema>;
export type ShipmentReading = z.infer<typeof shipmentReadingSchema>;
