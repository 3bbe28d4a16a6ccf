// The hint under a datetime field of a site's event: which clock the typed time is read on, named as it reads then.
import { siteWallTimeToInstant, siteZoneName } from '@shared/sites/site-clock.js';

/**
 * "At the site's clock (CST)"; the zone's name at the time typed (or now), so a date across a DST change reads CDT.
 * Before the site's zone is known: "At the site's clock".
 */
export function siteClockHint(typed: string, timeZone: string | null | undefined, clock = "the site's clock"): string {
  if (!timeZone) return `At ${clock}`;
  return `At ${clock} (${siteZoneName(siteWallTimeToInstant(typed, timeZone) ?? new Date(), timeZone)})`;
}
