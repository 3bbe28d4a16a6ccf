// Instants in Vialyard's PDFs (and the mail that carries them) on the site's own clock with the zone's short name:
// the reader is at the farm, not at the server, and "CST"/"CDT" tells the repeated autumn hour apart. Built on the
// app's own site clock (shared/sites/site-clock.ts), so a PDF names a zone as the pages do.
import { siteWallTime, siteZoneName } from '../../shared/sites/site-clock.js';

type Instant = Date | string | number;

/** "2026-11-28 14:50 CST". */
export function formatSiteTime(instant: Instant, timeZone: string): string {
  const at = new Date(instant);
  return `${siteWallTime(at, timeZone).replace('T', ' ')} ${siteZoneName(at, timeZone)}`;
}

/** "14:50 CST", where the date is already printed beside it. */
export function formatSiteClock(instant: Instant, timeZone: string): string {
  return formatSiteTime(instant, timeZone).slice(11);
}

/** The zone's short names from one instant to another, e.g. "CDT/CST" for a month with the clock change. */
export function zoneNames(from: Instant, to: Instant, timeZone: string): string {
  return [...new Set([siteZoneName(new Date(from), timeZone), siteZoneName(new Date(to), timeZone)])].join('/');
}

/** The one wording every PDF's footer ends with. */
export function madeByVialyard(madeAt: Instant, timeZone: string): string {
  return `Made by Vialyard on ${formatSiteTime(madeAt, timeZone)}`;
}
