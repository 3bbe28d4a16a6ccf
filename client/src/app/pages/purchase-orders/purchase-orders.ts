// Purchase orders: purchasing enters what it expects; receiving and veterinarians read them.
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatTableModule } from '@angular/material/table';
import { firstValueFrom, forkJoin } from 'rxjs';
import type { PurchaseOrderStatus, PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { PurchaseOrderDialog, type PurchaseOrderDialogData } from './purchase-order-dialog';
import { PurchaseOrdersApi } from './purchase-orders-api';

@Component({
  selector: 'vy-purchase-orders',
  imports: [MatTableModule, MatButtonModule, MatButtonToggleModule, MatIconModule],
  templateUrl: './purchase-orders.html',
  styleUrl: './purchase-orders.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchaseOrders {
  private readonly api = inject(PurchaseOrdersApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  private readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  protected readonly status = signal<PurchaseOrderStatus | ''>('open');
  protected readonly orders = rxResource({ params: () => this.status(), stream: ({ params }) => this.api.list(params) });
  protected readonly columns = ['reference', 'site', 'supplier', 'expected', 'lines', 'status', 'actions'];
  protected readonly canEdit = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing');
  });

  protected statusLabel(status: PurchaseOrderStatus): string {
    return { open: 'Open', received: 'Received', cancelled: 'Cancelled' }[status];
  }

  protected async openOrder(order: PurchaseOrderView | null): Promise<void> {
    const [suppliers, products] = await firstValueFrom(forkJoin([this.catalogue.suppliers(), this.catalogue.products()]));
    const data: PurchaseOrderDialogData = { order, sites: this.sites(), suppliers, products };
    this.dialog.open(PurchaseOrderDialog, { data, width: '640px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.orders.reload());
  }

  protected async cancel(order: PurchaseOrderView): Promise<void> {
    // A cancelled order cannot be reopened.
    if (!window.confirm(`Cancel order ${order.reference}? It cannot be reopened.`)) return;
    await firstValueFrom(this.api.cancel(order.id));
    this.orders.reload();
  }
}
