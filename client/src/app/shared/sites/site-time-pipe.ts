// Shows an instant on a site's own clock with the zone's short name: the farm's time, not the reader's browser's.
import { LOCALE_ID, Pipe, PipeTransform, inject } from '@angular/core';
import { siteTimeText, type SiteTimeStyle } from '@shared/sites/site-clock.js';

/** The browser's own zone: what a time tied to no one site is shown in (still with its zone's name). */
export const readerTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/**
 * `{{ check.checkedAt | siteTime: fridge.timeZone }}` ("Dec 4, 2026, 8:30 AM CST"), or `| siteTime: zone : 'time'` ("8:30 AM CST").
 * No zone (a time no one site owns, such as a notification's): the reader's own clock, named all the same.
 */
@Pipe({ name: 'siteTime' })
export class SiteTimePipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(instant: string | number | Date | null | undefined, timeZone: string | null | undefined, style: SiteTimeStyle = 'medium'): string {
    if (instant == null || instant === '') return '—';
    return siteTimeText(instant, timeZone || readerTimeZone(), style, this.locale);
  }
}
