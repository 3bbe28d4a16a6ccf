// Home card for receiving clerks (and admins): shipments due today and overdue, and a way to receive one.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EMPTY } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { ReceivingApi } from '../../shared/receiving/receiving-api';

@Component({
  selector: 'vy-receiving-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink],
  template: `
    @if (visible()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">local_shipping</mat-icon>
          <mat-card-title><h2>Receiving</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          @if (expected(); as list) {
            @if (bySite().length) {
              <ul class="sites">
                @for (site of bySite(); track site.siteId) {
                  <li>
                    <a [routerLink]="['/receiving']" [queryParams]="{ site: site.siteId }">{{ site.siteName }}</a>:
                    {{ site.today }} due today · <span [class.bad]="site.overdue > 0">{{ site.overdue }} overdue</span>
                  </li>
                }
              </ul>
            } @else {
              <p>Nothing due today or overdue.</p>
            }
          } @else {
            <p>Loading…</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-flat-button routerLink="/receiving" [queryParams]="bySite().length ? { site: bySite()[0].siteId } : {}">Open receiving</a>
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `
    h2 { margin: 0; font: var(--mat-sys-title-medium); }
    .sites { margin: 0; padding-left: 20px; }
    .bad { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceivingCard {
  private readonly auth = inject(AuthStore);
  protected readonly visible = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'receiving');
  });
  protected readonly expected = toSignal(this.auth.hasRole('admin', 'receiving') ? inject(ReceivingApi).expected() : EMPTY);
  /** Sites with shipments due today or overdue, the most overdue first: each links to its own receiving list. */
  protected readonly bySite = computed(() => {
    const sites = new Map<number, { siteId: number; siteName: string; today: number; overdue: number }>();
    for (const order of this.expected() ?? []) {
      if (order.due !== 'today' && order.due !== 'overdue') continue;
      const site = sites.get(order.siteId) ?? { siteId: order.siteId, siteName: order.siteName, today: 0, overdue: 0 };
      site[order.due === 'today' ? 'today' : 'overdue']++;
      sites.set(order.siteId, site);
    }
    return [...sites.values()].sort((a, b) => b.overdue - a.overdue || b.today - a.today || a.siteName.localeCompare(b.siteName));
  });
}
