// Instants on a site's own clock: a check done at 08:30 at the farm reads 08:30 wherever the reader's browser is.
// Only Intl, so the client can use it without a date library. Building a formatter costs far more than using one
// (it loads the zone's rules): one per locale, zone and style, kept.
export type SiteTimeStyle = 'medium' | 'short' | 'time' | 'date';

const styles: Record<SiteTimeStyle, Intl.DateTimeFormatOptions> = {
  /** "Dec 4, 2026, 8:30 AM CST" */
  medium: { year: 'numeric', month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit', timeZoneName: 'short' },
  /** "12/4/26, 8:30 AM CST" */
  short: { year: '2-digit', month: 'numeric', day: 'numeric', hour: 'numeric', minute: '2-digit', timeZoneName: 'short' },
  /** "8:30 AM CST" */
  time: { hour: 'numeric', minute: '2-digit', timeZoneName: 'short' },
  /** "Dec 4, 2026": the site's calendar day, no zone (a day needs none). */
  date: { year: 'numeric', month: 'short', day: 'numeric' },
};

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(key: string, build: () => Intl.DateTimeFormat): Intl.DateTimeFormat {
  let made = formatters.get(key);
  if (!made) {
    made = build();
    formatters.set(key, made);
  }
  return made;
}

/** The instant as the site's clock shows it, with the zone's short name (its offset where the locale has no name). */
export function siteTimeText(instant: Date | string | number, timeZone: string, style: SiteTimeStyle = 'medium', locale = 'en-US'): string {
  return formatter(`${locale}|${timeZone}|${style}`, () => new Intl.DateTimeFormat(locale, { ...styles[style], timeZone })).format(new Date(instant));
}

/** The zone's short name at that instant ("CST", "CDT", "GMT+1"): DST changes it. */
export function siteZoneName(instant: Date | number, timeZone: string, locale = 'en-US'): string {
  const parts = formatter(`${locale}|${timeZone}|zone`, () => new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' })).formatToParts(new Date(instant));
  return parts.find((p) => p.type === 'timeZoneName')?.value ?? timeZone;
}

/** How far the site's clock is ahead of UTC at that instant, in milliseconds. */
function zoneOffsetMs(instant: number, timeZone: string): number {
  const parts = formatter(`wall|${timeZone}`, () =>
    new Intl.DateTimeFormat('en-US', { timeZone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit' }),
  ).formatToParts(new Date(instant));
  const part = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  const wallAsUtc = Date.UTC(part('year'), part('month') - 1, part('day'), part('hour'), part('minute'), part('second'));
  return wallAsUtc - Math.floor(instant / 1000) * 1000;
}

const DAY_MS = 86_400_000;
const wallPattern = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/;

/**
 * The instant a site's wall-clock time ("2026-12-04T08:30", as a datetime-local field gives it) stands for; null when
 * the text is not one. A time the clock skips when DST starts lands an hour later; a repeated one takes its first pass.
 */
export function siteWallTimeToInstant(wall: string, timeZone: string): Date | null {
  const match = wallPattern.exec(wall);
  if (!match) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((n) => Number(n ?? 0));
  const wallAsUtc = Date.UTC(year!, month! - 1, day!, hour!, minute!, second!);
  if (Number.isNaN(wallAsUtc)) return null;
  // The instant lies within 14 h of the wall time read as UTC: a day either side is before and after any change of
  // offset near it (changes are months apart). Each side's offset gives a candidate; the right ones read back as the wall.
  const candidates = [-DAY_MS, DAY_MS].map((side) => wallAsUtc - zoneOffsetMs(wallAsUtc + side, timeZone));
  const readsBack = candidates.filter((instant) => instant + zoneOffsetMs(instant, timeZone) === wallAsUtc);
  return new Date(readsBack.length ? Math.min(...readsBack) : candidates[0]!);
}

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * The instant as the site's wall clock reads it, "2026-12-04T08:30", as a datetime-local field takes it: the inverse of
 * `siteWallTimeToInstant` (seconds dropped), so a form can show a stored or current time on the site's clock.
 */
export function siteWallTime(instant: Date | string | number, timeZone: string): string {
  const ms = new Date(instant).getTime();
  const wall = new Date(Math.floor(ms / 1000) * 1000 + zoneOffsetMs(ms, timeZone));
  return `${wall.getUTCFullYear()}-${pad(wall.getUTCMonth() + 1)}-${pad(wall.getUTCDate())}T${pad(wall.getUTCHours())}:${pad(wall.getUTCMinutes())}`;
}
