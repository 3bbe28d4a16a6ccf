// Dates and local days at a site: "today" and the month of a record are the site's, not the server's.
import { DateTime } from 'luxon';

/** YYYY-MM-DD at the site for an instant. */
export function siteDate(ms: number, timeZone: string): string {
  return DateTime.fromMillis(ms, { zone: timeZone }).toISODate()!;
}

/** The instants where a local day starts and the next begins (23 or 25 hours apart on a clock change). */
export function siteDayBounds(date: string, timeZone: string): { start: number; end: number } {
  const start = DateTime.fromISO(date, { zone: timeZone }).startOf('day');
  return { start: start.toMillis(), end: start.plus({ days: 1 }).toMillis() };
}

/** The instants a local month (YYYY-MM) starts and ends. */
export function siteMonthBounds(month: string, timeZone: string): { start: number; end: number } {
  const start = DateTime.fromISO(`${month}-01`, { zone: timeZone }).startOf('month');
  return { start: start.toMillis(), end: start.plus({ months: 1 }).toMillis() };
}
