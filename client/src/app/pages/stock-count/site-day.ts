// A count's day on the site's clock ("Dec 4, 2026"): a count done late in the evening at the farm is that evening's,
// wherever the reader is. One formatter per locale and zone, kept (building one loads the zone's rules).
const formatters = new Map<string, Intl.DateTimeFormat>();

export function siteDayText(instant: string | number | Date | null | undefined, timeZone: string, locale = 'en-US'): string {
  if (instant == null || instant === '') return '—';
  const key = `${locale}|${timeZone}`;
  let made = formatters.get(key);
  if (!made) {
    made = new Intl.DateTimeFormat(locale, { year: 'numeric', month: 'short', day: 'numeric', timeZone });
    formatters.set(key, made);
  }
  return made.format(new Date(instant));
}
