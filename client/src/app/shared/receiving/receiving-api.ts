// Calls for receiving: expected and recent shipments, the form's context, sending a shipment, and a shipment's record.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { catchError, map, of, tap, type Observable } from 'rxjs';
import type { PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import type { ReceivingContext, ShipmentSummary, ShipmentView } from '@shared/receiving/shipment-view.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

const contextKey = (siteId: number) => `vialyard.receiving-context.v1.${siteId}`;

@Injectable({ providedIn: 'root' })
export class ReceivingApi {
  private readonly http = inject(HttpClient);

  expected(siteId?: number): Observable<PurchaseOrderView[]> {
    const params: Record<string, number> = siteId ? { siteId } : {};
    return this.http.get<{ items: PurchaseOrderView[] }>('/api/shipments/expected', { params }).pipe(map((body) => body.items));
  }

  recent(siteId?: number, limit = 20): Observable<ShipmentSummary[]> {
    const params: Record<string, number> = siteId ? { siteId, limit } : { limit };
    return this.http.get<{ items: ShipmentSummary[] }>('/api/shipments', { params }).pipe(map((body) => body.items));
  }

  purchaseOrder(id: number): Observable<PurchaseOrderView> {
    return this.http.get<PurchaseOrderView>(`/api/purchase-orders/${id}`, { context: handlesOwnErrors() });
  }

  /** The site's fridges and setting, or the copy from the last load when offline. */
  context(siteId: number): Observable<ReceivingContext | null> {
    return this.http.get<ReceivingContext>(`/api/shipments/sites/${siteId}/context`, { context: handlesOwnErrors() }).pipe(
      tap((value) => localStorage.setItem(contextKey(siteId), JSON.stringify(value))),
      catchError(() => of(JSON.parse(localStorage.getItem(contextKey(siteId)) ?? 'null') as ReceivingContext | null)),
    );
  }

  receive(siteId: number, shipment: unknown, photos: { blob: Blob; name: string }[]): Observable<ShipmentView> {
    const body = new FormData();
    body.append('shipment', JSON.stringify(shipment));
    for (const photo of photos) body.append('photos', photo.blob, photo.name);
    return this.http.post<ShipmentView>(`/api/shipments/sites/${siteId}`, body, { context: handlesOwnErrors() });
  }

  shipment(id: number): Observable<ShipmentView> {
    return this.http.get<ShipmentView>(`/api/shipments/${id}`);
  }

  addPhotos(id: number, photos: File[]): Observable<ShipmentView> {
    const body = new FormData();
    for (const photo of photos) body.append('photos', photo, photo.name);
    return this.http.post<ShipmentView>(`/api/shipments/${id}/photos`, body);
  }

  mailReport(id: number): Observable<ShipmentView> {
    return this.http.post<ShipmentView>(`/api/shipments/${id}/report/mail`, {});
  }
}
