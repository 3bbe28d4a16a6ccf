// Home card for purchasing (and admins) across their sites: shortfalls first, then orders to place, then expiring stock, then open orders.
import { CurrencyPipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EMPTY } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { DemandApi } from '../../shared/flocks/demand-api';

/** Each list shows its most urgent few (the overview sends a few more, and counts them all); the purchasing page has the rest. */
const SHOWN = 4;

@Component({
  selector: 'vy-purchasing-outlook-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink, DecimalPipe, CurrencyPipe],
  templateUrl: './purchasing-outlook-card.html',
  styleUrl: './purchasing-outlook-card.scss',
  host: { '[class.shown]': 'visible()' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchasingOutlookCard {
  private readonly auth = inject(AuthStore);
  protected readonly visible = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing');
  });
  protected readonly overview = toSignal(this.auth.hasRole('admin', 'purchasing') ? inject(DemandApi).overview() : EMPTY);
  protected readonly shortfalls = computed(() => (this.overview()?.shortfalls ?? []).slice(0, SHOWN));
  protected readonly toPlace = computed(() => (this.overview()?.ordersToPlace ?? []).slice(0, SHOWN));
  /** Lots lost before use first (they cost money), then lots expiring soon; a lot in both lists shows once. */
  private readonly allExpiring = computed(() => {
    const o = this.overview();
    if (!o) return [];
    const lost = o.expireUnused.map((a) => ({ key: `u${a.siteId}-${a.lotId}`, text: `${a.productName} lot ${a.lotNumber}, ${a.expiry}`, detail: 'expires before any planned use', value: a.valueLost, site: a.siteName }));
    const soon = o.expiring.map((a) => ({ key: `e${a.siteId}-${a.lotId}`, text: `${a.productName} lot ${a.lotNumber}, ${a.expiry}`, detail: a.window === 0 ? 'expired' : `within ${a.window} days`, value: a.value, site: a.siteName }));
    return [...lost, ...soon.filter((s) => !lost.some((l) => l.key.slice(1) === s.key.slice(1)))];
  });
  protected readonly expiring = computed(() => this.allExpiring().slice(0, SHOWN));
  protected readonly openOrders = computed(() => (this.overview()?.openOrders ?? []).slice(0, SHOWN));
  /** The site of the most urgent item (a shortfall, else an order to place): where "Open purchasing" goes. */
  protected readonly urgentSite = computed(() => {
    const o = this.overview();
    return o?.shortfalls[0]?.siteId ?? o?.ordersToPlace[0]?.siteId ?? o?.expireUnused[0]?.siteId ?? o?.expiring[0]?.siteId ?? null;
  });
  protected readonly counts = computed(() => {
    const o = this.overview();
    return o ? { short: o.totals.shortfalls, place: o.totals.ordersToPlace, expiring: o.totals.expiringLots, open: o.totals.openOrders } : null;
  });
}
