// The calls for purchasing: projections, the overview, stock settings and proposals, orders sent to suppliers, planned transfers.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Observable } from 'rxjs';
import type { PlannedTransferInput, PlannedTransferView, ProductStockSettingsInput, ProductStockSettingsView } from '@shared/demand/demand-schemas.js';
import type { SiteProjectionView } from '@shared/demand/projection-view.js';
import type { PurchasingOverview } from '@shared/demand/purchasing-overview.js';
import type { SafetyStockProposalView } from '@shared/demand/safety-stock-proposal.js';
import type { SentOrderView } from '@shared/demand/sent-order-view.js';
import type { PurchaseOrderInput } from '@shared/receiving/purchase-order-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

type Body<T> = { [K in keyof T]?: unknown };

@Injectable({ providedIn: 'root' })
export class DemandApi {
  private readonly http = inject(HttpClient);
  private readonly own = { context: handlesOwnErrors() };

  overview(): Observable<PurchasingOverview> {
    return this.http.get<PurchasingOverview>('/api/demand/overview');
  }

  projection(siteId: number): Observable<SiteProjectionView> {
    return this.http.get<SiteProjectionView>(`/api/demand/sites/${siteId}/projection`);
  }

  saveSettings(siteId: number, productId: number, input: Body<ProductStockSettingsInput>): Observable<ProductStockSettingsView> {
    return this.http.put<ProductStockSettingsView>(`/api/demand/sites/${siteId}/products/${productId}/settings`, input, this.own);
  }

  proposeSafetyStock(siteId: number, productId: number, serviceLevel: number): Observable<SafetyStockProposalView> {
    return this.http.post<SafetyStockProposalView>(`/api/demand/sites/${siteId}/products/${productId}/safety-stock-proposal`, { serviceLevel }, this.own);
  }

  createAndSend(siteId: number, input: Body<PurchaseOrderInput>): Observable<SentOrderView> {
    return this.http.post<SentOrderView>(`/api/demand/sites/${siteId}/orders`, input, this.own);
  }

  send(orderId: number): Observable<SentOrderView> {
    return this.http.post<SentOrderView>(`/api/demand/purchase-orders/${orderId}/send`, {});
  }

  pdfUrl(orderId: number): string {
    return `/api/demand/purchase-orders/${orderId}/pdf`;
  }

  planTransfer(siteId: number, input: Body<PlannedTransferInput>): Observable<PlannedTransferView> {
    return this.http.post<PlannedTransferView>(`/api/demand/sites/${siteId}/transfers`, input, this.own);
  }

  cancelTransfer(id: number): Observable<PlannedTransferView> {
    return this.http.post<PlannedTransferView>(`/api/demand/transfers/${id}/cancel`, {});
  }
}
