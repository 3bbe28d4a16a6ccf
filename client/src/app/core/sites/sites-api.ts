// Reads the sites the signed-in user may see; an admin changes one.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { SiteSettings, SiteView } from '@shared/sites/site-schemas.js';
import { handlesOwnErrors } from '../http/error-interceptor';

@Injectable({ providedIn: 'root' })
export class SitesApi {
  private readonly http = inject(HttpClient);

  list(): Observable<SiteView[]> {
    return this.http.get<{ items: SiteView[] }>('/api/sites').pipe(map((body) => body.items));
  }

  /** Saves a site's name, zone and the settings given (the others are kept); the caller shows errors. */
  update(site: SiteView, settings: Partial<SiteSettings>): Observable<SiteView> {
    const body = { code: site.code, name: site.name, timeZone: site.timeZone, settings };
    return this.http.put<SiteView>(`/api/sites/${site.id}`, body, { context: handlesOwnErrors() });
  }
}
