// GTIN rules the catalogue and the scanner share: check digit, accepted lengths, 14-digit normal form.
import { BarcodeError } from './barcode-error.js';
import { gs1CheckDigit, hasValidGs1CheckDigit } from './gs1-check-digit.js';

/** GTIN-8, GTIN-12 (UPC-A), GTIN-13 (EAN-13) and GTIN-14. */
export const GTIN_LENGTHS: readonly number[] = [8, 12, 13, 14];

/** Check digit for a GTIN body of 7, 11, 12 or 13 digits. */
export function gtinCheckDigit(body: string): number {
  if (!/^\d+$/.test(body) || !GTIN_LENGTHS.includes(body.length + 1)) {
    throw new BarcodeError(`a GTIN body has 7, 11, 12 or 13 digits, got ${JSON.stringify(body)}`);
  }
  return gs1CheckDigit(body);
}

/** True for an 8, 12, 13 or 14 digit GTIN whose check digit is right. */
export function isValidGtin(gtin: string): boolean {
  return /^\d+$/.test(gtin) && GTIN_LENGTHS.includes(gtin.length) && hasValidGs1CheckDigit(gtin);
}

/** The 14-digit form (left-padded with zeros) used for storage and comparison; throws on an invalid GTIN. */
export function normalizeGtin(code: string): string {
  if (!/^\d+$/.test(code) || !GTIN_LENGTHS.includes(code.length)) {
    throw new BarcodeError(`a GTIN has 8, 12, 13 or 14 digits, got ${JSON.stringify(code)}`);
  }
  if (!hasValidGs1CheckDigit(code)) {
    const expected = gs1CheckDigit(code.slice(0, -1));
    throw new BarcodeError(`GTIN ${code} has a wrong check digit: it should end in ${expected}`);
  }
  return code.padStart(14, '0');
}
