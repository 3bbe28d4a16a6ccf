// The purchase order calls.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { PurchaseOrderStatus, PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export interface PurchaseOrderBody {
  supplierId: number | null;
  reference: string;
  expectedDate: string;
  carrier: string;
  trackingNumber: string;
  notes: string;
  lines: { presentationId: number | null; packs: number }[];
}

@Injectable({ providedIn: 'root' })
export class PurchaseOrdersApi {
  private readonly http = inject(HttpClient);

  list(status: PurchaseOrderStatus | ''): Observable<PurchaseOrderView[]> {
    const params: Record<string, string> = status ? { status } : {};
    return this.http.get<{ items: PurchaseOrderView[] }>('/api/purchase-orders', { params }).pipe(map((body) => body.items));
  }

  save(siteId: number, id: number | null, body: PurchaseOrderBody): Observable<PurchaseOrderView> {
    return id === null
      ? this.http.post<PurchaseOrderView>(`/api/purchase-orders/sites/${siteId}`, body, { context: handlesOwnErrors() })
      : this.http.put<PurchaseOrderView>(`/api/purchase-orders/${id}`, body, { context: handlesOwnErrors() });
  }

  cancel(id: number): Observable<PurchaseOrderView> {
    return this.http.post<PurchaseOrderView>(`/api/purchase-orders/${id}/cancel`, {});
  }
}
