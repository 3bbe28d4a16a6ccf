// Purchasing's view of a site: shortfalls, orders to place, stock against the planned vaccinations, expiring stock, transfers, open orders.
import { DecimalPipe, CurrencyPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, linkedSignal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, RouterLink } from '@angular/router';
import { firstValueFrom, of } from 'rxjs';
import { presentationLabel } from '@shared/catalogue/presentation-label.js';
import type { ProductStockSettingsView } from '@shared/demand/demand-schemas.js';
import type { ExpireUnusedAlert, ExpiringAlert, ReorderSuggestion } from '@shared/demand/projection-types.js';
import type { SentOrderView } from '@shared/demand/sent-order-view.js';
import type { TransferCandidate } from '@shared/demand/transfer-candidates.js';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { DemandApi } from '../../shared/flocks/demand-api';
import { SitePicker } from '../../shared/flocks/site-picker';
import { StatusChip } from '../../shared/flocks/status-chip';
import { OrderDialog, type OrderDialogData } from './order-dialog';
import { StockSettingsDialog, type StockSettingsDialogData } from './stock-settings-dialog';
import { TransferDialog, type TransferDialogData } from './transfer-dialog';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { CountPipe } from '../../shared/text/count-pipe';

@Component({
  selector: 'vy-purchasing',
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, DecimalPipe, CurrencyPipe, SiteTimePipe, SitePicker, StatusChip, CountPipe],
  templateUrl: './purchasing.html',
  styleUrl: './purchasing.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Purchasing {
  private readonly api = inject(DemandApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthStore);
  private readonly catalogue = inject(CatalogueApi);
  private readonly suppliers = toSignal(this.catalogue.suppliers(), { initialValue: [] });
  protected readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  /** A link may name the site (`?site=`, as the home card's does); else the first of the user's sites. */
  private readonly linkedSite = Number(inject(ActivatedRoute).snapshot.queryParamMap.get('site')) || null;
  protected readonly siteId = linkedSignal<number | null>(() => this.sites().find((site) => site.id === this.linkedSite)?.id ?? this.sites()[0]?.id ?? null);
  /** The site's zone: an order's sendings read on its clock. */
  protected readonly siteZone = computed(() => this.sites().find((site) => site.id === this.siteId())?.timeZone);
  protected readonly canBuy = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing');
  });
  protected readonly projection = rxResource({
    params: () => this.siteId(),
    stream: ({ params }) => (params === null ? of(undefined) : this.api.projection(params)),
  });
  protected readonly p = computed(() => this.projection.value());
  protected readonly productColumns = computed(() => ['product', 'onHand', 'onHold', 'incoming', 'needed', 'short', 'safety', 'lowest', ...(this.canBuy() ? ['settings'] : [])]);
  protected readonly suggestionColumns = computed(() => ['product', 'supplier', 'needDate', 'orderBy', 'quantity', 'value', ...(this.canBuy() ? ['order'] : [])]);
  protected readonly settingsByProduct = computed(() => new Map((this.p()?.settings ?? []).map((s) => [s.productId, s])));
  /**
   * Each lot once: a lot the plan leaves to expire unused is listed there (it costs money), with its expiry alert as a
   * note; "expiring soon" keeps only the other lots. The home card shows them the same way.
   */
  protected readonly expiringStock = computed(() => {
    const alerts = this.p()?.alerts;
    if (!alerts) return { unused: [] as (ExpireUnusedAlert & { soon?: ExpiringAlert })[], soon: [] as ExpiringAlert[] };
    const soonByLot = new Map(alerts.expiring.map((a) => [a.lotId, a]));
    const unusedLots = new Set(alerts.expireUnused.map((a) => a.lotId));
    return {
      unused: alerts.expireUnused.map((a) => ({ ...a, soon: soonByLot.get(a.lotId) })),
      soon: alerts.expiring.filter((a) => !unusedLots.has(a.lotId)),
    };
  });

  protected pdfUrl(order: SentOrderView): string {
    return this.api.pdfUrl(order.id);
  }

  /** One order per supplier: every suggestion for the same supplier becomes a line of it. */
  protected createOrder(suggestion: ReorderSuggestion): void {
    const view = this.p();
    if (!view) return;
    const sameSupplier = view.suggestions.filter((s) => s.supplierId === suggestion.supplierId);
    const data: OrderDialogData = {
      siteId: view.siteId,
      siteName: view.siteName,
      today: view.today,
      reference: view.nextReference,
      supplierId: suggestion.supplierId,
      suppliers: this.suppliers(),
      lines: sameSupplier.map((s) => ({ presentationId: s.presentationId, packs: s.packs })),
    };
    this.dialog
      .open(OrderDialog, { data, width: '720px', maxWidth: '96vw' })
      .afterClosed()
      .subscribe((sent) => {
        if (!sent) return;
        const mailed = sent.lastSent?.mailed;
        this.snackBar.open(
          mailed ? `Order ${sent.reference} sent to ${sent.lastSent!.to}.` : `Order ${sent.reference} saved, but the mail did not go: send it again from Open orders.`,
          'Dismiss',
          { duration: 8000 },
        );
        this.projection.reload();
      });
  }

  protected async editSettings(settings: ProductStockSettingsView): Promise<void> {
    const products = await firstValueFrom(this.catalogue.products());
    const product = products.find((p) => p.id === settings.productId);
    const data: StockSettingsDialogData = {
      settings,
      suppliers: this.suppliers(),
      presentations: (product?.presentations ?? [])
        .filter((p) => p.status === 'confirmed')
        .map((p) => ({ id: p.id, productId: p.productId, label: presentationLabel(product!.name, p), dosesPerVial: p.dosesPerVial, vialsPerPack: p.vialsPerPack, unitPrice: p.unitPrice })),
    };
    this.dialog.open(StockSettingsDialog, { data, width: '640px', maxWidth: '96vw' }).afterClosed().subscribe((saved) => saved && this.projection.reload());
  }

  protected planTransfer(productName: string, candidate: TransferCandidate): void {
    const view = this.p();
    if (!view) return;
    const data: TransferDialogData = { siteId: view.siteId, siteName: view.siteName, productName, today: view.today, candidate };
    this.dialog.open(TransferDialog, { data, width: '520px', maxWidth: '96vw' }).afterClosed().subscribe((saved) => saved && this.projection.reload());
  }

  protected async cancelTransfer(id: number): Promise<void> {
    await firstValueFrom(this.api.cancelTransfer(id));
    this.projection.reload();
  }

  protected async send(order: SentOrderView): Promise<void> {
    const sent = await firstValueFrom(this.api.send(order.id));
    this.snackBar.open(sent.lastSent?.mailed ? `Order ${sent.reference} sent to ${sent.lastSent.to}.` : 'The mail did not go; try again shortly.', 'Dismiss', { duration: 6000 });
    this.projection.reload();
  }
}
