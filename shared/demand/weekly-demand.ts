// Past use as weekly totals: the demand history the textbook safety-stock rule reads.
import { daysBetween, type IsoDate } from '../planning/iso-date.js';

export interface UseEvent {
  readonly date: IsoDate;
  /** Doses used (issued less returned); a return alone may make a day negative. */
  readonly doses: number;
}

/**
 * Whole weeks ending yesterday, oldest first, from the week of the first use within `maxWeeks` (earlier weeks
 * with no use yet say nothing about demand). Vaccination is lumpy day to day; a week evens that out.
 */
export function weeklyDemand(events: readonly UseEvent[], today: IsoDate, maxWeeks = 52): number[] {
  const weeksAgo = (date: IsoDate) => Math.floor((daysBetween(date, today) - 1) / 7);
  const counted = events.filter((event) => {
    const ago = daysBetween(event.date, today);
    return ago >= 1 && ago <= maxWeeks * 7;
  });
  if (!counted.length) return [];
  const oldest = Math.max(...counted.map((event) => weeksAgo(event.date)));
  const totals = new Array<number>(oldest + 1).fill(0);
  for (const event of counted) totals[oldest - weeksAgo(event.date)]! += event.doses;
  return totals.map((total) => Math.max(0, total));
}
