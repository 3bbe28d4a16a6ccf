// The signed-in user as a signal, and the calls that change it.
import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { Role } from '@shared/auth/roles.js';
import type { DisplayUnit, SessionUser } from '@shared/users/user-schemas.js';
import { handlesOwnErrors } from '../http/error-interceptor';

@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly http = inject(HttpClient);
  private readonly router = inject(Router);
  private readonly current = signal<SessionUser | null>(null);

  readonly user = this.current.asReadonly();
  readonly signedIn = computed(() => this.current() !== null);
  readonly displayUnit = computed<DisplayUnit>(() => this.current()?.displayUnit ?? 'F');

  hasRole(...roles: Role[]): boolean {
    const user = this.current();
    return !!user && roles.some((role) => user.roles.includes(role));
  }

  /** Asks the server who is signed in; also hands the browser its XSRF cookie. */
  async loadSession(): Promise<void> {
    try {
      const { user } = await firstValueFrom(
        this.http.get<{ user: SessionUser | null }>('/api/auth/session', { context: handlesOwnErrors() }),
      );
      this.current.set(user);
    } catch {
      this.current.set(null);
    }
  }

  async signIn(email: string, password: string): Promise<void> {
    const { user } = await firstValueFrom(
      this.http.post<{ user: SessionUser }>('/api/auth/sign-in', { email, password }, { context: handlesOwnErrors() }),
    );
    this.current.set(user);
  }

  async signOut(): Promise<void> {
    try {
      await firstValueFrom(this.http.post('/api/auth/sign-out', {}));
    } finally {
      this.forget();
    }
  }

  /** Drops the user locally (after sign-out, or when the server says the session ended). */
  forget(): void {
    this.current.set(null);
    void this.router.navigate(['/sign-in']);
  }

  replaceUser(user: SessionUser): void {
    this.current.set(user);
  }
}
