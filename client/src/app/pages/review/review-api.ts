// The review queue and the signed decisions.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { HoldDecisionKind } from '@shared/lots/lot-status.js';
import type { QueueEvent } from '@shared/lots/review-queue.js';
import type { RecallInput } from '@shared/lots/recall-schema.js';
import type { TroubleshootingInput } from '@shared/lots/troubleshooting-schema.js';

export type { QueueEvent, QueueLot } from '@shared/lots/review-queue.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

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

  saveTroubleshooting(eventId: number, record: Omit<TroubleshootingInput, never>): Observable<unknown> {
    return this.http.put(`/api/holds/events/${eventId}/troubleshooting`, record, { context: handlesOwnErrors() });
  }

  recall(request: RecallInput): Observable<unknown> {
    return this.http.post('/api/holds/recalls', request, { context: handlesOwnErrors() });
  }

  decide(holdId: number, request: DecisionRequest): Observable<unknown> {
    return this.http.post(`/api/holds/${holdId}/decisions`, { ...request, supersedesId: null }, { context: handlesOwnErrors() });
  }
}
