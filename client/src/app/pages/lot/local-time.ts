// Converts between a datetime-local field's value (read on a site's clock) and an instant the API takes.
import { siteWallTime, siteWallTimeToInstant } from '@shared/sites/site-clock.js';

export function localInputValue(date: Date, timeZone: string): string {
  return siteWallTime(date, timeZone);
}

/** Empty or unreadable input gives '' so the server names the field. */
export function instantFromInput(value: string, timeZone: string): string {
  return siteWallTimeToInstant(value, timeZone)?.toISOString() ?? '';
}
