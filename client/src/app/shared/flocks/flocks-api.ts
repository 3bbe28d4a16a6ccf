// The calls for houses, flocks, bird counts, vaccinations and programmes.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { BirdCountInput } from '@shared/flocks/bird-count-schemas.js';
import type { FlockInput, FlockSummary, FlockView } from '@shared/flocks/flock-schemas.js';
import type { HouseInput, HouseView } from '@shared/flocks/house-schemas.js';
import type { ProgrammeInput, ProgrammeView } from '@shared/flocks/programme-schemas.js';
import type { VaccinationChange, VaccinationInput, VaccinationView } from '@shared/flocks/vaccination-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

/** What the API accepts: the schemas' input side (defaults may be left out). */
type Body<T> = { [K in keyof T]?: unknown };

@Injectable({ providedIn: 'root' })
export class FlocksApi {
  private readonly http = inject(HttpClient);
  private readonly own = { context: handlesOwnErrors() };

  houses(siteId: number): Observable<HouseView[]> {
    return this.http.get<{ items: HouseView[] }>(`/api/houses/sites/${siteId}`).pipe(map((body) => body.items));
  }

  saveHouse(siteId: number, id: number | null, input: Body<HouseInput>): Observable<HouseView> {
    return id === null ? this.http.post<HouseView>(`/api/houses/sites/${siteId}`, input, this.own) : this.http.put<HouseView>(`/api/houses/${id}`, input, this.own);
  }

  flocks(siteId: number | null, includeDepleted = false): Observable<FlockSummary[]> {
    const params: Record<string, string> = { includeDepleted: String(includeDepleted) };
    if (siteId !== null) params['siteId'] = String(siteId);
    return this.http.get<{ items: FlockSummary[] }>('/api/flocks', { params }).pipe(map((body) => body.items));
  }

  flock(id: number): Observable<FlockView> {
    return this.http.get<FlockView>(`/api/flocks/${id}`);
  }

  createFlock(houseId: number, input: Body<FlockInput>): Observable<FlockView> {
    return this.http.post<FlockView>(`/api/flocks/houses/${houseId}`, input, this.own);
  }

  updateFlock(id: number, input: Body<FlockInput>): Observable<FlockView> {
    return this.http.put<FlockView>(`/api/flocks/${id}`, input, this.own);
  }

  addBirdCount(flockId: number, input: Body<BirdCountInput>): Observable<FlockView> {
    return this.http.post<FlockView>(`/api/flocks/${flockId}/bird-counts`, input, this.own);
  }

  deplete(flockId: number, depletedOn: string): Observable<FlockView> {
    return this.http.post<FlockView>(`/api/flocks/${flockId}/depletion`, { depletedOn }, this.own);
  }

  addVaccination(flockId: number, input: Body<VaccinationInput>): Observable<VaccinationView> {
    return this.http.post<VaccinationView>(`/api/vaccinations/flocks/${flockId}`, input, this.own);
  }

  changeVaccination(id: number, change: Body<VaccinationChange>): Observable<VaccinationView> {
    return this.http.patch<VaccinationView>(`/api/vaccinations/${id}`, change, this.own);
  }

  confirmVaccination(id: number): Observable<VaccinationView> {
    return this.http.post<VaccinationView>(`/api/vaccinations/${id}/confirm`, {});
  }

  cancelVaccination(id: number, reason: string): Observable<VaccinationView> {
    return this.http.post<VaccinationView>(`/api/vaccinations/${id}/cancel`, { reason }, this.own);
  }

  overrideWithdrawal(id: number, reason: string): Observable<VaccinationView> {
    return this.http.post<VaccinationView>(`/api/vaccinations/${id}/withdrawal-override`, { reason }, this.own);
  }

  programmes(): Observable<ProgrammeView[]> {
    return this.http.get<{ items: ProgrammeView[] }>('/api/programmes').pipe(map((body) => body.items));
  }

  saveProgramme(id: number | null, input: Body<ProgrammeInput>): Observable<ProgrammeView> {
    return id === null ? this.http.post<ProgrammeView>('/api/programmes', input, this.own) : this.http.put<ProgrammeView>(`/api/programmes/${id}`, input, this.own);
  }
}
