// On the fridge page: the lots in the fridge (linked to their pages), whether its stock count is due, and its count sheet.
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { countDueReasonLabels } from '@shared/lots/count-due.js';
import { LotStatusChip } from '../../shared/lots/lot-status-chip';
import { LotsApi } from '../../shared/lots/lots-api';
import { siteTimeText } from '@shared/sites/site-clock.js';

@Component({
  selector: 'vy-count-due-note',
  imports: [MatButtonModule, MatIconModule, RouterLink, LotStatusChip],
  template: `
    @if (sheet.value(); as s) {
      <div class="note" [class.due]="s.due.due">
        <span>
          @if (s.due.due) {
            <strong>Stock count due:</strong> {{ reasons() }}.
          } @else {
            Stock last counted {{ lastCounted() }}.
          }
        </span>
        <a mat-button [routerLink]="['/fridges', fridgeId(), 'count']"><mat-icon>inventory</mat-icon>Count sheet</a>
      </div>
      <details class="stock">
        <summary>Vaccine in this fridge: {{ s.lines.length }} lot{{ s.lines.length === 1 ? '' : 's' }}, {{ vials() }} vials</summary>
        <ul>
          @for (line of s.lines; track line.lotId) {
            <li><a [routerLink]="['/lots', line.lotId]">Lot {{ line.lotNumber }}</a> · {{ line.product }} · expiry {{ line.expiry }} · {{ line.expected }} vials <vy-lot-status-chip [status]="line.status" /></li>
          } @empty {
            <li>None.</li>
          }
        </ul>
      </details>
    }
  `,
  styles: `
    .note { display: flex; flex-wrap: wrap; align-items: center; gap: 4px 12px; margin: 0 0 8px; padding: 4px 12px; border-radius: 8px; background: var(--mat-sys-surface-container); }
    .note.due { background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
    .note.due a { color: inherit; }
    .stock { margin: 0 0 16px; }
    .stock summary { cursor: pointer; font: var(--mat-sys-title-small); padding: 4px 0; }
    .stock ul { margin: 4px 0 0; padding-left: 20px; }
    .stock li { margin: 4px 0; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CountDueNote {
  readonly fridgeId = input.required<number>();
  private readonly api = inject(LotsApi);
  protected readonly sheet = rxResource({ params: () => this.fridgeId(), stream: ({ params }) => this.api.sheet(params) });
  protected readonly reasons = computed(() => (this.sheet.value()?.due.reasons ?? []).map((r) => countDueReasonLabels[r]).join('; '));
  private readonly locale = inject(LOCALE_ID);
  /** The day on the site's calendar. */
  protected readonly lastCounted = computed(() => {
    const sheet = this.sheet.value();
    return sheet ? (sheet.due.lastCountAt != null ? siteTimeText(sheet.due.lastCountAt, sheet.fridge.timeZone, 'date', this.locale) : '—') : '';
  });
  protected readonly vials = computed(() => (this.sheet.value()?.lines ?? []).reduce((sum, line) => sum + line.expected, 0));
}
