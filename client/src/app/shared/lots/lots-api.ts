// Lots, their movements and stock counts, as the lots, lot, count-sheet pages and the storage card call them.
import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { LotFilterOptions, LotListPage } from '@shared/lots/lot-list.js';
import type { LotPage } from '@shared/lots/lot-page.js';
import type { DiscardReason } from '@shared/lots/discard-reasons.js';
import type { CountDue } from '@shared/lots/count-due.js';
import type { LotStatus } from '@shared/lots/lot-status.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export type { LotFilterOptions, LotListItem, LotListPage } from '@shared/lots/lot-list.js';
export type { LotPage } from '@shared/lots/lot-page.js';

export interface LotListRequest {
  q?: string;
  productId?: number | null;
  siteId?: number | null;
  fridgeId?: number | null;
  status?: LotStatus | '';
  expiryFrom?: string;
  expiryTo?: string;
  sort?: string;
  page?: number;
  pageSize?: number;
}

export interface TransferRequest {
  fromFridgeId: number;
  toFridgeId: number;
  vials: number;
  leftAt: string;
  at: string;
  notes: string;
  plannedTransferId?: number | null;
}

export interface TransferResult {
  movementId: number;
  timeOutMinutes: number;
  limitMinutes: number | null;
  holdOpened: boolean;
}

export interface DiscardRequest {
  fridgeId: number;
  vials: number;
  reason: DiscardReason;
  reasonText: string;
}

export interface FridgeCountDue extends CountDue {
  fridgeId: number;
  fridgeCode: string;
  fridgeName: string;
  siteId: number;
  siteName: string;
  lastCountAt: string | null;
}

export interface CountSheet {
  fridge: { id: number; code: string; name: string; siteId: number; siteName: string; timeZone: string };
  due: FridgeCountDue;
  lines: { lotId: number; lotNumber: string; product: string; dosesPerVial: number; expiry: string; expected: number; status: LotStatus }[];
  recentCounts: { id: number; countedAt: string; countedBy: string; notes: string; lines: { lotId: number; lotNumber: string; expected: number; counted: number; difference: number; reason: string }[] }[];
}

export interface CountRequest {
  lines: { lotId: number; expected: number; counted: number; reason: string }[];
  notes: string;
}

@Injectable({ providedIn: 'root' })
export class LotsApi {
  private readonly http = inject(HttpClient);

  list(request: LotListRequest): Observable<LotListPage> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(request)) {
      if (value !== undefined && value !== null && value !== '') params = params.set(key, String(value));
    }
    return this.http.get<LotListPage>('/api/lots', { params });
  }

  filters(): Observable<LotFilterOptions> {
    return this.http.get<LotFilterOptions>('/api/lots/filters');
  }

  get(lotId: number): Observable<LotPage> {
    return this.http.get<LotPage>(`/api/lots/${lotId}`);
  }

  transfer(lotId: number, request: TransferRequest): Observable<TransferResult> {
    return this.http.post<TransferResult>(`/api/lots/${lotId}/transfers`, request, { context: handlesOwnErrors() });
  }

  discard(lotId: number, request: DiscardRequest): Observable<unknown> {
    return this.http.post(`/api/lots/${lotId}/discards`, request, { context: handlesOwnErrors() });
  }

  countsDue(): Observable<FridgeCountDue[]> {
    return this.http.get<{ items: FridgeCountDue[] }>('/api/stock-counts/due').pipe(map((body) => body.items));
  }

  sheet(fridgeId: number): Observable<CountSheet> {
    return this.http.get<CountSheet>(`/api/stock-counts/fridges/${fridgeId}/sheet`);
  }

  submitCount(fridgeId: number, request: CountRequest): Observable<{ id: number; adjustments: number }> {
    return this.http.post<{ id: number; adjustments: number }>(`/api/stock-counts/fridges/${fridgeId}`, request, { context: handlesOwnErrors() });
  }
}
