// The catalogue calls, with the last product list kept on the phone so the receiving form can match scans offline.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { catchError, map, of, tap, type Observable } from 'rxjs';
import type { PresentationInput, PresentationProposal } from '@shared/catalogue/presentation-schemas.js';
import type { ProductInput, ProductView } from '@shared/catalogue/product-schemas.js';
import type { SupplierInput, SupplierView } from '@shared/catalogue/supplier-schemas.js';
import type { PresentationView } from '@shared/catalogue/presentation-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

const cacheKey = 'vialyard.catalogue.v1';

/** What the API accepts: the schemas' input side (defaults may be left out, GTINs typed as text). */
type Body<T> = { [K in keyof T]?: unknown };

@Injectable({ providedIn: 'root' })
export class CatalogueApi {
  private readonly http = inject(HttpClient);

  products(): Observable<ProductView[]> {
    return this.http.get<{ items: ProductView[] }>('/api/catalogue/products').pipe(map((body) => body.items));
  }

  /** The products, or the copy from the last successful load when the phone is offline. */
  productsForReceiving(): Observable<ProductView[]> {
    return this.http.get<{ items: ProductView[] }>('/api/catalogue/products', { context: handlesOwnErrors() }).pipe(
      map((body) => body.items),
      tap((items) => localStorage.setItem(cacheKey, JSON.stringify(items))),
      catchError(() => of(JSON.parse(localStorage.getItem(cacheKey) ?? '[]') as ProductView[])),
    );
  }

  suppliers(): Observable<SupplierView[]> {
    return this.http.get<{ items: SupplierView[] }>('/api/catalogue/suppliers').pipe(map((body) => body.items));
  }

  saveProduct(id: number | null, input: Body<ProductInput>): Observable<ProductView> {
    return id === null
      ? this.http.post<ProductView>('/api/catalogue/products', input, { context: handlesOwnErrors() })
      : this.http.put<ProductView>(`/api/catalogue/products/${id}`, input, { context: handlesOwnErrors() });
  }

  savePresentation(productId: number, id: number | null, input: Body<PresentationInput>): Observable<PresentationView> {
    return id === null
      ? this.http.post<PresentationView>(`/api/catalogue/products/${productId}/presentations`, input, { context: handlesOwnErrors() })
      : this.http.put<PresentationView>(`/api/catalogue/presentations/${id}`, input, { context: handlesOwnErrors() });
  }

  saveSupplier(id: number | null, input: Body<SupplierInput>): Observable<SupplierView> {
    return id === null
      ? this.http.post<SupplierView>('/api/catalogue/suppliers', input, { context: handlesOwnErrors() })
      : this.http.put<SupplierView>(`/api/catalogue/suppliers/${id}`, input, { context: handlesOwnErrors() });
  }

  propose(proposal: Body<PresentationProposal>): Observable<{ product: ProductView; presentationId: number }> {
    return this.http.post<{ product: ProductView; presentationId: number }>('/api/catalogue/proposals', proposal, { context: handlesOwnErrors() });
  }
}
