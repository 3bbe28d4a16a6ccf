// The vaccination day's API: the day sheet, one vaccination's run, and each step of it.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { DayLead, DaySheet, RunView, WaterVolumeView } from '@shared/vaccination-day/day-views.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export type { DayLead, DaySheet, DaySheetEntry, RunView, CheckView, LotOut, LotToTake } from '@shared/vaccination-day/day-views.js';
export type { WaterVolumeView as WaterVolume } from '@shared/vaccination-day/day-views.js';

export interface SiteCrew {
  day: string;
  crew: { leadId: number; leadName: string; members: { id: number; name: string }[] } | null;
  candidates: { id: number; name: string; roles: string[] }[];
}

@Injectable({ providedIn: 'root' })
export class DayApi {
  private readonly http = inject(HttpClient);
  private readonly base = '/api/vaccination-day';

  /** A crew lead's day sheet: one's own, or (admins and veterinarians) the lead's given. */
  sheet(day: string, leadId?: number | null): Observable<DaySheet> {
    return this.http.get<DaySheet>(`${this.base}/sheet`, { params: leadId ? { day, leadId } : { day } });
  }

  /** The crew leads assigned on a day, on the sites one sees. */
  leads(day: string): Observable<DayLead[]> {
    return this.http.get<{ items: DayLead[] }>(`${this.base}/leads`, { params: { day } }).pipe(map((body) => body.items));
  }

  waterVolumes(productId?: number): Observable<WaterVolumeView[]> {
    const params: Record<string, number> = productId ? { productId } : {};
    return this.http.get<{ items: WaterVolumeView[] }>(`${this.base}/water-volumes`, { params }).pipe(map((body) => body.items));
  }

  historyUrl(flockId: number, format: 'csv' | 'pdf'): string {
    return `${this.base}/flocks/${flockId}/history.${format}`;
  }

  run(vaccinationId: number): Observable<RunView> {
    return this.http.get<RunView>(`${this.base}/vaccinations/${vaccinationId}`);
  }

  /** One step of the run (checks, trial, start, issues, mixings, returns, record); the answer is the run as it now stands. */
  step(vaccinationId: number, path: string, body: object = {}): Observable<RunView> {
    return this.http.post<RunView>(`${this.base}/vaccinations/${vaccinationId}/${path}`, body, { context: handlesOwnErrors() });
  }

  crew(siteId: number, day: string): Observable<SiteCrew> {
    return this.http.get<SiteCrew>(`${this.base}/sites/${siteId}/crew`, { params: { day } });
  }

  assignCrew(body: { siteId: number; day: string; leadId: number; memberIds: number[] }): Observable<unknown> {
    return this.http.post(`${this.base}/crews`, body, { context: handlesOwnErrors() });
  }

  addWaterVolume(body: { productId: number; ageFromDays: number; ageToDays: number; mlPer1000Birds: number; source: 'label' | 'veterinarian'; note: string }): Observable<unknown> {
    return this.http.post(`${this.base}/water-volumes`, body, { context: handlesOwnErrors() });
  }

  addTrialPhoto(vaccinationId: number, file: File): Observable<RunView> {
    const form = new FormData();
    form.append('photos', file, file.name);
    return this.http.post<RunView>(`${this.base}/vaccinations/${vaccinationId}/trial/photos`, form, { context: handlesOwnErrors() });
  }

  trialPhotoUrl(photoId: number): string {
    return `${this.base}/trial-photos/${photoId}`;
  }

  mixingSheetUrl(vaccinationId: number): string {
    return `${this.base}/vaccinations/${vaccinationId}/mixing-sheet.pdf`;
  }
}
