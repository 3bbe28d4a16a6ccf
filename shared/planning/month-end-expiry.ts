// Expiry dates printed as month/year: the vaccine is good through the last day of that month (PHAC National Vaccine Storage and Handling Guidelines 2007 §8.2).
import { daysInMonth, isIsoDate, type IsoDate } from './iso-date.js';

const YEAR_MONTH = /^(\d{4})-(0[1-9]|1[0-2])$/;

export function isYearMonth(text: unknown): text is string {
  return typeof text === 'string' && YEAR_MONTH.test(text);
}

/** "2027-03" → "2027-03-31"; "2028-02" → "2028-02-29". */
export function monthEndExpiry(yearMonth: string): IsoDate {
  const match = YEAR_MONTH.exec(yearMonth);
  if (!match) throw new RangeError(`not a year and month (YYYY-MM): ${JSON.stringify(yearMonth)}`);
  const lastDay = daysInMonth(Number(match[1]), Number(match[2]));
  return `${match[1]}-${match[2]}-${String(lastDay).padStart(2, '0')}`;
}

/** Accepts a full date or a month/year expiry and returns the last usable day. */
export function normalizeExpiry(expiry: string): IsoDate {
  if (isIsoDate(expiry)) return expiry;
  if (isYearMonth(expiry)) return monthEndExpiry(expiry);
  throw new RangeError(`expiry must be YYYY-MM-DD or YYYY-MM: ${JSON.stringify(expiry)}`);
}
