// Flags vaccinations planned too close to slaughter (common practice: none within 21 days before; the product label's withdrawal period governs).
import { daysBetween, type IsoDate } from './iso-date.js';

export const DEFAULT_WITHDRAWAL_DAYS = 21;

/**
 * True when the vaccination is inside the withdrawal window: fewer than `withdrawalDays` whole days before depletion.
 * Boundary: exactly `withdrawalDays` before depletion is allowed (depletion − 21 days is fine, − 20 is flagged);
 * a vaccination on or after the depletion date is always flagged.
 */
export function isInWithdrawalWindow(
  vaccinationDate: IsoDate,
  depletionDate: IsoDate,
  withdrawalDays: number = DEFAULT_WITHDRAWAL_DAYS,
): boolean {
  if (!Number.isSafeInteger(withdrawalDays) || withdrawalDays < 0) {
    throw new RangeError(`withdrawal days must be a non-negative whole number, got ${withdrawalDays}`);
  }
  const daysBeforeDepletion = daysBetween(vaccinationDate, depletionDate);
  return daysBeforeDepletion <= 0 || daysBeforeDepletion < withdrawalDays;
}
