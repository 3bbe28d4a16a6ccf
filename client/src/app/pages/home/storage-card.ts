// Home card for storage staff (admins and veterinarians too): fridges not checked today, open excursions, stale data, calibrations and stock counts due.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EMPTY } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { FridgesApi } from '../fridges/fridges-api';
import { countDueReasonLabels } from '@shared/lots/count-due.js';
import { LotsApi, type FridgeCountDue } from '../../shared/lots/lots-api';

@Component({
  selector: 'vy-storage-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink, SiteTimePipe, TemperaturePipe],
  template: `
    @if (visible()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">kitchen</mat-icon>
          <mat-card-title><h2>Storage</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          @if (overview(); as o) {
            @if (!o.fridges.length) {
              <p>No fridge on your sites yet.</p>
            }
            @if (unchecked().length) {
              <h3>Not checked today</h3>
              <ul>
                @for (f of unchecked(); track f.id) {
                  <li><a [routerLink]="['/fridges', f.id]">{{ f.code }}</a> · {{ f.checksToday }} of {{ f.checksNeeded }} checks</li>
                }
              </ul>
            }
            @if (o.openExcursions.length) {
              <h3>Undecided excursions</h3>
              <ul>
                @for (e of o.openExcursions.slice(0, 5); track e.id) {
                  <li><a [routerLink]="['/fridges', e.fridgeId]">{{ e.fridgeCode }}</a> · {{ e.kind === 'high' ? 'too warm' : 'too cold' }}, peak {{ e.peakC | temperature }}, {{ e.start | siteTime: zoneOf(e.fridgeId) : 'short' }}</li>
                }
              </ul>
              <p class="advice">Keep exposed vaccine at proper temperature, marked "do not use"; do not discard it unless directed. The veterinarian decides.</p>
            }
            @if (stale().length) {
              <h3>No recent data</h3>
              <ul>
                @for (f of stale(); track f.id) {
                  <li><a [routerLink]="['/fridges', f.id]">{{ f.code }}</a> · newest reading {{ f.newestReadingAt ? (f.newestReadingAt | siteTime: f.timeZone : 'short') : 'none yet' }}</li>
                }
              </ul>
            }
            @if (o.calibrations.length) {
              <h3>Calibrations due</h3>
              <ul>
                @for (c of o.calibrations; track c.loggerId) {
                  <li><a [routerLink]="['/fridges', c.fridgeId]">{{ c.fridgeCode }}</a> · logger {{ c.serial }}: {{ c.status === 'none' ? 'no certificate' : c.status === 'overdue' ? 'overdue since ' + c.dueOn : 'due ' + c.dueOn }}</li>
                }
              </ul>
            }
            @if (countsDue()?.length) {
              <h3>Stock count due</h3>
              <ul>
                @for (c of countsDue(); track c.fridgeId) {
                  <li><a [routerLink]="['/fridges', c.fridgeId, 'count']">{{ c.fridgeCode }}</a> · {{ countDueText(c) }}</li>
                }
              </ul>
            }
            @if (o.fridges.length && allClear()) {
              <p>Every fridge is checked, in range and reporting.</p>
            }
          } @else {
            <p>Loading…</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-flat-button routerLink="/fridges">Open fridges</a>
          @if (canCheck()) {
            <a mat-button routerLink="/daily-check">Record a check</a>
          }
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `
    h2 { margin: 0; font: var(--mat-sys-title-medium); }
    h3 { margin: 12px 0 4px; font: var(--mat-sys-title-small); }
    ul { margin: 0; padding-left: 20px; }
    .advice { margin: 8px 0 0; padding: 8px; border-radius: 8px; background: var(--vy-warn-container); color: var(--vy-on-warn-container); font: var(--mat-sys-body-small); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StorageCard {
  private readonly auth = inject(AuthStore);
  protected readonly visible = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage', 'veterinarian');
  });
  protected readonly canCheck = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage');
  });
  protected readonly overview = toSignal(this.auth.hasRole('admin', 'storage', 'veterinarian') ? inject(FridgesApi).overview() : EMPTY);
  /** Counts due monthly and after each delivery into the fridge (common practice for vaccine stock). */
  protected readonly countsDue = toSignal(this.auth.hasRole('admin', 'storage', 'veterinarian') ? inject(LotsApi).countsDue() : EMPTY);
  /** Each fridge's site zone: times of a fridge's events are shown on its site's clock. */
  private readonly zones = computed(() => new Map((this.overview()?.fridges ?? []).map((f) => [f.id, f.timeZone])));
  protected zoneOf(fridgeId: number): string | undefined {
    return this.zones().get(fridgeId);
  }
  protected readonly unchecked = computed(() => (this.overview()?.fridges ?? []).filter((f) => f.checksToday < f.checksNeeded));
  protected readonly stale = computed(() => (this.overview()?.fridges ?? []).filter((f) => f.noRecentData));
  protected readonly allClear = computed(() => {
    const o = this.overview();
    return !!o && !this.unchecked().length && !this.stale().length && !o.openExcursions.length && !o.calibrations.length && !this.countsDue()?.length;
  });

  protected countDueText(due: FridgeCountDue): string {
    return due.reasons.map((r) => countDueReasonLabels[r]).join('; ');
  }
}
