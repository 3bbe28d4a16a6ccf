// The fridge-log calls: fridges, loggers and certificates, log imports, chart data, events and daily checks.
import { HttpClient, HttpEvent } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { ChartData } from '@shared/fridges/chart-data.js';
import type { DailyCheckInput, DailyCheckView } from '@shared/fridges/daily-check-schemas.js';
import type { FridgeEvents } from '@shared/fridges/excursion-view.js';
import type { FridgeDetail, FridgeInput, FridgeStatus, FridgeView } from '@shared/fridges/fridge-schemas.js';
import type { ImportOutcome, ImportProgress, LogImportDetail, LogImportView } from '@shared/fridges/log-import-view.js';
import type { StoredLogMapping } from '@shared/fridges/log-mapping-schema.js';
import type { CertificateView, LoggerInput, LoggerUpdate, LoggerView } from '@shared/fridges/logger-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export interface StorageOverview {
  fridges: FridgeStatus[];
  openExcursions: { id: number; fridgeId: number; fridgeCode: string; kind: 'high' | 'low'; start: string; peakC: number; status: string; source: string }[];
  calibrations: { loggerId: number; serial: string; fridgeId: number; fridgeCode: string; dueOn: string | null; status: 'due-soon' | 'overdue' | 'none' }[];
}

@Injectable({ providedIn: 'root' })
export class FridgesApi {
  private readonly http = inject(HttpClient);

  list(): Observable<FridgeStatus[]> {
    return this.http.get<{ items: FridgeStatus[] }>('/api/fridges').pipe(map((body) => body.items));
  }

  overview(): Observable<StorageOverview> {
    return this.http.get<StorageOverview>('/api/fridges/overview');
  }

  get(id: number): Observable<FridgeDetail> {
    return this.http.get<FridgeDetail>(`/api/fridges/${id}`);
  }

  create(input: FridgeInput): Observable<FridgeView> {
    return this.http.post<FridgeView>('/api/fridges', input, { context: handlesOwnErrors() });
  }

  update(id: number, input: FridgeInput): Observable<FridgeView> {
    return this.http.put<FridgeView>(`/api/fridges/${id}`, input, { context: handlesOwnErrors() });
  }

  chart(fridgeId: number, from: Date, to: Date): Observable<ChartData> {
    return this.http.get<ChartData>(`/api/readings/fridges/${fridgeId}/chart`, { params: { from: from.toISOString(), to: to.toISOString() } });
  }

  events(fridgeId: number): Observable<FridgeEvents> {
    return this.http.get<FridgeEvents>(`/api/excursions/fridges/${fridgeId}`);
  }

  recordAction(excursionId: number, actionTaken: string): Observable<unknown> {
    return this.http.patch(`/api/excursions/${excursionId}`, { actionTaken });
  }

  imports(fridgeId: number): Observable<LogImportView[]> {
    return this.http.get<{ items: LogImportView[] }>(`/api/log-imports/fridges/${fridgeId}`).pipe(map((body) => body.items));
  }

  importDetail(id: number): Observable<LogImportDetail> {
    return this.http.get<LogImportDetail>(`/api/log-imports/${id}`);
  }

  /** Upload events (for the progress bar) and, last, the response; errors are the caller's to show. */
  upload(loggerId: number, file: File, mapping: StoredLogMapping, progressToken: string): Observable<HttpEvent<ImportOutcome>> {
    const form = new FormData();
    form.append('mapping', JSON.stringify(mapping));
    form.append('progressToken', progressToken);
    form.append('file', file, file.name);
    return this.http.post<ImportOutcome>(`/api/log-imports/loggers/${loggerId}`, form, { reportProgress: true, observe: 'events', context: handlesOwnErrors() });
  }

  progress(token: string): Observable<ImportProgress> {
    return this.http.get<ImportProgress>(`/api/log-imports/progress/${token}`, { context: handlesOwnErrors() });
  }

  addLogger(input: LoggerInput): Observable<LoggerView> {
    return this.http.post<LoggerView>('/api/loggers', input, { context: handlesOwnErrors() });
  }

  updateLogger(id: number, input: LoggerUpdate): Observable<LoggerView> {
    return this.http.patch<LoggerView>(`/api/loggers/${id}`, input, { context: handlesOwnErrors() });
  }

  addCertificate(loggerId: number, file: File, calibratedOn: string, dueOn: string): Observable<CertificateView> {
    const form = new FormData();
    form.append('calibratedOn', calibratedOn);
    form.append('dueOn', dueOn);
    form.append('file', file, file.name);
    return this.http.post<CertificateView>(`/api/loggers/${loggerId}/certificates`, form, { context: handlesOwnErrors() });
  }

  dailyChecks(fridgeId: number): Observable<DailyCheckView[]> {
    return this.http.get<{ items: DailyCheckView[] }>(`/api/daily-checks/fridges/${fridgeId}`).pipe(map((body) => body.items));
  }

  recordCheck(input: DailyCheckInput): Observable<DailyCheckView> {
    return this.http.post<DailyCheckView>('/api/daily-checks', input, { context: handlesOwnErrors() });
  }
}
