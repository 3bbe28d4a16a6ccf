// CSRF protection with csrf-sync's synchroniser token kept in the session; Angular echoes it from the XSRF-TOKEN cookie.
import type { NextFunction, Request, Response } from 'express';
import { csrfSync } from 'csrf-sync';
import { AppError } from './app-error.js';

export const csrfCookieName = 'XSRF-TOKEN';
export const csrfHeaderName = 'x-xsrf-token';

const { csrfSynchronisedProtection, generateToken } = csrfSync({
  getTokenFromRequest: (req) => req.get(csrfHeaderName),
});

/** Rejects a state-changing request whose header does not carry the session's token, with our error shape. */
export function csrfProtection(req: Request, res: Response, next: NextFunction): void {
  csrfSynchronisedProtection(req, res, (error?: unknown) => {
    if (error) return next(new AppError(403, 'csrf', 'The page is out of date (security token missing or wrong): reload it and try again.'));
    next();
  });
}

/** Hands the browser the session's token as a readable cookie (created on first need, renewed after sign-in). */
export function issueCsrfCookie(req: Request, res: Response, overwrite = false): string {
  const token = generateToken(req, overwrite);
  res.cookie(csrfCookieName, token, { sameSite: 'lax', secure: req.secure, httpOnly: false, path: '/' });
  return token;
}

/** Sets the cookie on reads so a fresh page always has a token before its first form is sent. */
export function csrfCookieOnReads(req: Request, res: Response, next: NextFunction): void {
  if (req.method === 'GET' && req.session) issueCsrfCookie(req, res);
  next();
}
