// Times of the demo's story on each site's own clock: a delivery comes in the morning whatever hour the demo is seeded.
import { DateTime } from 'luxon';

/** The instant at `time` ("HH:mm", local) on the site's calendar day `days` from today (negative: in the past). */
export function siteTime(zone: string, days: number, time: string, now = Date.now()): Date {
  const [hour, minute] = time.split(':').map(Number);
  return DateTime.fromMillis(now, { zone }).startOf('day').plus({ days }).set({ hour, minute }).toJSDate();
}
