// The users administration calls.
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Observable } from 'rxjs';
import type { CreateUserInput, UpdateUserInput, UserSummary } from '@shared/users/user-schemas.js';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

export interface UserPageQuery {
  search: string;
  sort: 'name' | 'email' | 'createdAt';
  direction: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

@Injectable({ providedIn: 'root' })
export class UsersApi {
  private readonly http = inject(HttpClient);

  list(query: UserPageQuery): Observable<{ items: UserSummary[]; total: number }> {
    const params: Record<string, string | number> = { sort: query.sort, direction: query.direction, page: query.page, pageSize: query.pageSize };
    if (query.search.trim()) params['search'] = query.search.trim();
    return this.http.get<{ items: UserSummary[]; total: number }>('/api/users', { params });
  }

  create(input: CreateUserInput): Observable<UserSummary> {
    return this.http.post<UserSummary>('/api/users', input, { context: handlesOwnErrors() });
  }

  update(id: number, input: UpdateUserInput): Observable<UserSummary> {
    return this.http.patch<UserSummary>(`/api/users/${id}`, input, { context: handlesOwnErrors() });
  }
}
