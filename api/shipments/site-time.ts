// Formats an instant on a site's own clock for reports and mail (the reader is at the farm, not at the server).
import { DateTime } from 'luxon';

export function formatSiteTime(instant: Date | string, timeZone: string): string {
  const value = typeof instant === 'string' ? DateTime.fromISO(instant) : DateTime.fromJSDate(instant);
  return value.setZone(timeZone).toFormat('yyyy-LL-dd HH:mm ZZZZ');
}
