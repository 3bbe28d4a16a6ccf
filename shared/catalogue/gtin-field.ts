// A zod field for a GTIN typed or scanned into a form: spaces ignored, check digit verified, stored as 14 digits.
import { z } from 'zod';
import { BarcodeError, normalizeGtin } from '../barcode/index.js';

export const gtinField = z
  .string()
  .transform((text) => text.replace(/[\s-]/g, ''))
  .transform((text, context) => {
    try {
      return normalizeGtin(text);
    } catch (error) {
      context.addIssue({ code: 'custom', message: error instanceof BarcodeError ? `Not a valid GTIN: ${error.message}.` : 'Not a valid GTIN.' });
      return z.NEVER;
    }
  });

/** An optional GTIN: empty text or null means none; anything else must be a valid GTIN. */
export const optionalGtinField = z
  .string()
  .nullable()
  .optional()
  .transform((text, context) => {
    const digits = (text ?? '').replace(/[\s-]/g, '');
    if (!digits) return null;
    try {
      return normalizeGtin(digits);
    } catch (error) {
      context.addIssue({ code: 'custom', message: error instanceof BarcodeError ? `Not a valid GTIN: ${error.message}.` : 'Not a valid GTIN.' });
      return z.NEVER;
    }
  });
