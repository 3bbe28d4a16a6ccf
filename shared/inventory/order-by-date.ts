// The last day to place an order so it arrives, with margin, before stock first runs short.
import { addDays, type IsoDate } from '../planning/iso-date.js';

/** First shortfall date − supplier lead time − safety margin, all in whole days. */
export function orderByDate(firstShortfallDate: IsoDate, leadTimeDays: number, safetyMarginDays = 0): IsoDate {
  for (const [value, name] of [[leadTimeDays, 'lead time days'], [safetyMarginDays, 'safety margin days']] as const) {
    if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number ≥ 0, got ${value}`);
  }
  return addDays(firstShortfallDate, -(leadTimeDays + safetyMarginDays));
}
