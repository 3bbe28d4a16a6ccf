// GS1 YYMMDD dates (AIs 11, 13, 15, 17): validation and conversion to an ISO calendar date.
import { BarcodeError } from './barcode-error.js';
import { applyGs1CenturyRule } from './gs1-century-rule.js';

export interface Gs1Date {
  /** YYYY-MM-DD; for day "00" this is the last day of the month. */
  iso: string;
  /** False when the label gave day "00" (only year and month are known). */
  dayGiven: boolean;
}

function daysInMonth(year: number, month: number): number {
  // Day 0 of the next month is the last day of this one; Date.UTC handles leap years.
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** Parses YYMMDD using the GS1 century rule relative to `now`; throws a BarcodeError naming the fault. */
export function parseGs1Date(yymmdd: string, now: Date): Gs1Date {
  if (!/^\d{6}$/.test(yymmdd)) {
    throw new BarcodeError(`a date is 6 digits YYMMDD, got ${JSON.stringify(yymmdd)}`);
  }
  const year = applyGs1CenturyRule(Number(yymmdd.slice(0, 2)), now);
  const month = Number(yymmdd.slice(2, 4));
  const day = Number(yymmdd.slice(4, 6));
  if (month < 1 || month > 12) {
    throw new BarcodeError(`${yymmdd} has month ${yymmdd.slice(2, 4)}, which is not 01-12`);
  }
  const lastDay = daysInMonth(year, month);
  if (day > lastDay) {
    throw new BarcodeError(`${yymmdd} has day ${yymmdd.slice(4, 6)}, but ${year}-${yymmdd.slice(2, 4)} has ${lastDay} days`);
  }
  const dayGiven = day !== 0;
  const iso = `${String(year).padStart(4, '0')}-${yymmdd.slice(2, 4)}-${String(dayGiven ? day : lastDay).padStart(2, '0')}`;
  return { iso, dayGiven };
}
