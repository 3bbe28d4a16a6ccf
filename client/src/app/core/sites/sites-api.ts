// Reads the sites the signed-in user may see.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { SiteView } from '@shared/sites/site-schemas.js';

@Injectable({ providedIn: 'root' })
export class SitesApi {
  private readonly http = inject(HttpClient);

  list(): Observable<SiteView[]> {
    return this.http.get<{ items: SiteView[] }>('/api/sites').pipe(map((body) => body.items));
  }
}
