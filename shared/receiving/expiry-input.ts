// An expiry as typed or scanned: a full date, or a month/year that means the last day of that month.
import { isIsoDate } from '../planning/iso-date.js';
import { isYearMonth, monthEndExpiry } from '../planning/month-end-expiry.js';

export interface LotExpiry {
  /** YYYY-MM-DD, the last usable day. */
  expiry: string;
  /** False when the label gave only month and year. */
  dayGiven: boolean;
}

/** "2027-03-15" → given day; "2027-03" → 2027-03-31, day not given (PHAC 2007 §8.2); anything else → null. */
export function readExpiry(text: string): LotExpiry | null {
  const value = text.trim();
  if (isIsoDate(value)) return { expiry: value, dayGiven: true };
  if (isYearMonth(value)) return { expiry: monthEndExpiry(value), dayGiven: false };
  return null;
}
