// The review queue and the signed decisions.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { HoldDecisionKind } from '@shared/lots/lot-status.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export interface QueueLot {
  holdId: number;
  lotId: number;
  lotNumber: string;
  expiry: string;
  product: string;
  dosesPerVial: number;
  vials: number;
  doses: number;
  reason: string;
  openedAt: string;
}

export interface QueueEvent {
  cause: string;
  sourceKind: string;
  sourceId: number | null;
  openedAt: string;
  lots: QueueLot[];
  vials: number;
  doses: number;
}

export interface DecisionRequest {
  decision: HoldDecisionKind;
  condition: string;
  notes: string;
  password: string;
}

@Injectable({ providedIn: 'root' })
export class ReviewApi {
  private readonly http = inject(HttpClient);

  queue(): Observable<QueueEvent[]> {
    return this.http.get<{ items: QueueEvent[] }>('/api/holds/queue').pipe(map((body) => body.items));
  }

  decide(holdId: number, request: DecisionRequest): Observable<unknown> {
    return this.http.post(`/api/holds/${holdId}/decisions`, { ...request, supersedesId: null }, { context: handlesOwnErrors() });
  }
}
