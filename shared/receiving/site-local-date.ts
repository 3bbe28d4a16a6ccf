// A site's own calendar day for an instant: "due today" means today where the farm is, not where the server is.
// Building a formatter costs far more than using one (it loads the zone's rules): one per time zone, kept.
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

export function siteLocalDate(instant: Date, timeZone: string): string {
  const parts = formatterFor(timeZone).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

/** Whether an expected date is past, today or later on the site's calendar. */
export function dueState(expectedDate: string, today: string): 'overdue' | 'today' | 'later' {
  return expectedDate < today ? 'overdue' : expectedDate === today ? 'today' : 'later';
}
