// A site's own calendar day for an instant: "due today" means today where the farm is, not where the server is.
export function siteLocalDate(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

/** Whether an expected date is past, today or later on the site's calendar. */
export function dueState(expectedDate: string, today: string): 'overdue' | 'today' | 'later' {
  return expectedDate < today ? 'overdue' : expectedDate === today ? 'today' : 'later';
}
