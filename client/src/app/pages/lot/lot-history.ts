// Where a lot's vials have been: every movement, newest first, with the fridges on each side and who recorded it.
// Each time is on the clock of the site it happened at: arrival at the receiving side's, leaving at the giving side's.
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import type { LotPageMovement } from '@shared/lots/lot-page.js';
import type { MovementKind } from '@shared/lots/movement-kinds.js';

const kindLabels: Record<MovementKind, string> = {
  receive: 'Received',
  transfer: 'Transferred',
  issue: 'Issued to a vaccination',
  return: 'Returned from a vaccination',
  discard: 'Discarded',
  adjust: 'Count adjustment',
};

@Component({
  selector: 'vy-lot-history',
  imports: [MatTableModule, RouterLink, SiteTimePipe],
  template: `
    <section aria-labelledby="history-heading">
      <h2 id="history-heading">Where its vials have been</h2>
      <div class="table-wrap">
        <table mat-table [dataSource]="history()" aria-label="Movements of this lot">
          <ng-container matColumnDef="at">
            <th mat-header-cell *matHeaderCellDef>When</th>
            <td mat-cell *matCellDef="let m">
              {{ m.at | siteTime: atZone(m) }}
              @if (m.leftAt && m.leftAt !== m.at) { <div class="muted">left {{ m.leftAt | siteTime: leftZone(m) : 'time' }}</div> }
            </td>
          </ng-container>
          <ng-container matColumnDef="kind">
            <th mat-header-cell *matHeaderCellDef>What</th>
            <td mat-cell *matCellDef="let m">{{ kindLabel(m) }}</td>
          </ng-container>
          <ng-container matColumnDef="vials">
            <th mat-header-cell *matHeaderCellDef class="number">Vials</th>
            <td mat-cell *matCellDef="let m" class="number">{{ m.vials }}</td>
          </ng-container>
          <ng-container matColumnDef="from">
            <th mat-header-cell *matHeaderCellDef>From</th>
            <td mat-cell *matCellDef="let m">
              @if (m.from; as p) { @if (p.fridgeId) { @if (linkFridges()) { <a [routerLink]="['/fridges', p.fridgeId]">{{ p.fridgeCode }}</a> } @else { {{ p.fridgeCode }} } · } {{ p.siteName }} } @else { — }
            </td>
          </ng-container>
          <ng-container matColumnDef="to">
            <th mat-header-cell *matHeaderCellDef>To</th>
            <td mat-cell *matCellDef="let m">
              @if (m.to; as p) { @if (p.fridgeId) { @if (linkFridges()) { <a [routerLink]="['/fridges', p.fridgeId]">{{ p.fridgeCode }}</a> } @else { {{ p.fridgeCode }} } · } {{ p.siteName }} } @else { — }
            </td>
          </ng-container>
          <ng-container matColumnDef="reason">
            <th mat-header-cell *matHeaderCellDef>Note</th>
            <td mat-cell *matCellDef="let m">{{ m.reason || '—' }}<div class="muted">{{ m.recordedBy ?? 'Vialyard' }}</div></td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
      </div>
    </section>
  `,
  styles: `
    section { margin-top: 24px; }
    h2 { font: var(--mat-sys-title-large); margin: 0 0 8px; }
    .table-wrap { overflow-x: auto; }
    .number { text-align: right; }
    .muted { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    td.mat-column-at { white-space: nowrap; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotHistory {
  readonly history = input.required<LotPageMovement[]>();
  /** The lot's site's zone, for a side on a site the user does not see. */
  readonly timeZone = input.required<string>();
  /** Whether the reader may open fridge pages (else the codes are text: the route would send them home). */
  readonly linkFridges = input(true);
  protected readonly columns = ['at', 'kind', 'vials', 'from', 'to', 'reason'];

  /** Vials arrive (or are counted, issued, discarded) at the receiving side, else at the side they left. */
  protected atZone(m: LotPageMovement): string {
    return m.to?.timeZone ?? m.from?.timeZone ?? this.timeZone();
  }

  protected leftZone(m: LotPageMovement): string {
    return m.from?.timeZone ?? this.timeZone();
  }

  protected kindLabel(m: LotPageMovement): string {
    if (m.kind === 'adjust') return m.to ? 'Count adjustment (found)' : 'Count adjustment (missing)';
    if (m.kind === 'discard' && m.sourceKind === 'hold_decision') return 'Discarded by the veterinarian\'s decision';
    return kindLabels[m.kind];
  }
}
