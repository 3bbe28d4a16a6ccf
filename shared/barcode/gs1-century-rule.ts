// Turns a two-digit GS1 year into a full year (GS1 General Specifications §7.12).
import { BarcodeError } from './barcode-error.js';

/**
 * Full year for `yy` (0-99) relative to `now`. The window slides with the
 * current year instead of being fixed, so labels stay readable as decades pass.
 */
export function applyGs1CenturyRule(yy: number, now: Date): number {
  if (!Number.isInteger(yy) || yy < 0 || yy > 99) {
    throw new BarcodeError(`a two-digit year is 0-99, got ${yy}`);
  }
  // UTC so the result does not depend on the time zone of the machine running it.
  const currentYear = now.getUTCFullYear();
  if (Number.isNaN(currentYear)) throw new BarcodeError('the reference date for the century rule is invalid');
  const century = currentYear - (currentYear % 100);
  const difference = yy - (currentYear % 100);
  if (difference >= 51) return century - 100 + yy;
  if (difference <= -50) return century + 100 + yy;
  return century + yy;
}
