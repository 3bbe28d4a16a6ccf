// "1 lot", "3 lots", "1,200 doses": a count with its noun, singular or plural, instead of "lot(s)".
import { LOCALE_ID, Pipe, PipeTransform, inject } from '@angular/core';

@Pipe({ name: 'count' })
export class CountPipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  /** `{{ n | count: 'lot' }}`; irregular plurals as a second argument: `{{ n | count: 'flock' : 'flocks' }}`. */
  transform(value: number | null | undefined, singular: string, plural = `${singular}s`): string {
    if (value == null) return '';
    return `${value.toLocaleString(this.locale)} ${value === 1 ? singular : plural}`;
  }
}
