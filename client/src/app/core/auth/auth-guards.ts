// Route guards: signed in, signed out, and holding one of some roles.
import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import type { Role } from '@shared/auth/roles.js';
import { AuthStore } from './auth-store';

export const signedInGuard: CanActivateFn = (_route, state) => {
  const auth = inject(AuthStore);
  return auth.signedIn() || inject(Router).createUrlTree(['/sign-in'], { queryParams: { next: state.url } });
};

export const signedOutGuard: CanActivateFn = () => {
  return !inject(AuthStore).signedIn() || inject(Router).createUrlTree(['/']);
};

export function roleGuard(...roles: Role[]): CanActivateFn {
  return () => inject(AuthStore).hasRole(...roles) || inject(Router).createUrlTree(['/']);
}
