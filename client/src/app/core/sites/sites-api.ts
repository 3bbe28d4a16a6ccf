// Reads the sites the signed-in user may see; an admin creates and changes them (the sites page).
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { SiteInput, SiteView } from '@shared/sites/site-schemas.js';
import { handlesOwnErrors } from '../http/error-interceptor';

@Injectable({ providedIn: 'root' })
export class SitesApi {
  private readonly http = inject(HttpClient);

  list(): Observable<SiteView[]> {
    return this.http.get<{ items: SiteView[] }>('/api/sites').pipe(map((body) => body.items));
  }

  /** Creates a site (id null) or saves one: code, name, zone and the settings given (the others are kept); the caller shows errors. */
  save(id: number | null, input: SiteInput): Observable<SiteView> {
    return id === null
      ? this.http.post<SiteView>('/api/sites', input, { context: handlesOwnErrors() })
      : this.http.put<SiteView>(`/api/sites/${id}`, input, { context: handlesOwnErrors() });
  }
}
