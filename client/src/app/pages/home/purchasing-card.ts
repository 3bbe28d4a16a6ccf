// Home card for purchasing (and admins): open orders, and new barcodes from receiving waiting to be confirmed.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { HttpClient } from '@angular/common/http';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EMPTY, map } from 'rxjs';
import type { PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { CountPipe } from '../../shared/text/count-pipe';

@Component({
  selector: 'vy-purchasing-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink, CountPipe],
  template: `
    @if (visible()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">receipt_long</mat-icon>
          <mat-card-title><h2>Purchasing</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          <p>{{ openOrders() === undefined ? '…' : (openOrders() | count: 'open order') }}.</p>
          @if (proposals()) {
            <p class="waiting">{{ proposals() | count: 'new barcode' }} from receiving to confirm.</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-flat-button routerLink="/purchase-orders">Orders</a>
          <a mat-button routerLink="/catalogue">Catalogue</a>
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); } .waiting { color: var(--vy-on-warn-container); background: var(--vy-warn-container); padding: 4px 8px; border-radius: 8px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchasingCard {
  private readonly auth = inject(AuthStore);
  private readonly allowed = this.auth.hasRole('admin', 'purchasing');
  protected readonly visible = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing');
  });
  protected readonly openOrders = toSignal(
    this.allowed
      ? inject(HttpClient).get<{ items: PurchaseOrderView[] }>('/api/purchase-orders', { params: { status: 'open' } }).pipe(map((body) => body.items.length))
      : EMPTY,
  );
  protected readonly proposals = toSignal(
    this.allowed
      ? inject(CatalogueApi).products().pipe(map((products) => products.flatMap((p) => p.presentations).filter((p) => p.status === 'proposed').length))
      : EMPTY,
  );
}
