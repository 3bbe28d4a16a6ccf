// One interceptor for every failed call: turns it into an ApiError, shows the server's message, and sends 401s to sign-in.
import { HttpContext, HttpContextToken, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { catchError, throwError } from 'rxjs';
import { AuthStore } from '../auth/auth-store';
import { ApiError } from './api-error';

/** Set on a request whose caller shows the error itself (a form with field errors, the sign-in page). */
const ownErrors = new HttpContextToken<boolean>(() => false);

export function handlesOwnErrors(): HttpContext {
  return new HttpContext().set(ownErrors, true);
}

export const errorInterceptor: HttpInterceptorFn = (request, next) => {
  const snackBar = inject(MatSnackBar);
  const auth = inject(AuthStore);
  return next(request).pipe(
    catchError((error: unknown) => {
      const apiError = ApiError.from(error);
      if (apiError.status === 401 && !request.url.startsWith('/api/auth/')) {
        auth.forget();
      } else if (!request.context.get(ownErrors)) {
        snackBar.open(apiError.message, 'Dismiss', { duration: 8000, politeness: 'assertive' });
      }
      return throwError(() => apiError);
    }),
  );
};
