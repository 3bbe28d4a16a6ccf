// Today on a site's own calendar: flock ages, due vaccinations and the projection all count farm days.
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';

export function siteToday(site: { timeZone: string }, now = new Date()): string {
  return siteLocalDate(now, site.timeZone);
}
