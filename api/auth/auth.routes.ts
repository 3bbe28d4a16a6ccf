// Sign-in, sign-out, the current session, and each user's own password and display preference.
import type { Request, Response } from 'express';
import { promisify } from 'node:util';
import { changePasswordSchema, preferencesSchema, signInSchema } from '../../shared/users/user-schemas.js';
import type { AppContext } from '../app-context.js';
import { AppError } from '../http/app-error.js';
import { csrfCookieName, issueCsrfCookie } from '../http/csrf.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import type { PassportInstance } from './passport-setup.js';
import { SignInThrottle } from './sign-in-throttle.js';
import { changeOwnPassword, updatePreferences } from './account-service.js';

export const sessionCookieName = 'vialyard.sid';
const genericFailure = 'The e-mail or password is not right.';

function authenticate(passport: PassportInstance, req: Request, res: Response): Promise<Express.User | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (error: unknown, user: Express.User | false) =>
      error ? reject(error) : resolve(user),
    )(req, res, (error?: unknown) => (error ? reject(error) : undefined));
  });
}

export function authRoutes(context: AppContext, passport: PassportInstance) {
  const router = createSecureRouter('/api/auth');
  const { config } = context;
  const throttle = new SignInThrottle(context.pool, {
    perAccount: config.SIGN_IN_ACCOUNT_LIMIT,
    perAddress: config.SIGN_IN_ADDRESS_LIMIT,
    windowSeconds: config.SIGN_IN_WINDOW_SECONDS,
  });

  // The XSRF cookie comes with every read (csrfCookieOnReads), this one included.
  router.get('/session', { public: true }, (req, res) => {
    res.json({ user: req.user ?? null });
  });

  router.post('/sign-in', { public: true }, async (req, res) => {
    const input = parseInput(signInSchema, req.body, 'sign-in');
    const address = req.ip ?? 'unknown';
    const wait = await throttle.secondsBlocked(input.email, address);
    if (wait > 0) {
      const minutes = Math.ceil(wait / 60);
      res.set('Retry-After', String(wait));
      throw new AppError(429, 'throttled', `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`);
    }
    req.body = input;
    const user = await authenticate(passport, req, res);
    if (!user) {
      await throttle.recordFailure(input.email, address);
      throw new AppError(401, 'sign_in_failed', genericFailure);
    }
    await throttle.recordSuccess(input.email);
    // passport regenerates the session here, so an id planted before sign-in is worthless after it.
    await promisify(req.login.bind(req))(user);
    issueCsrfCookie(req, res, true);
    res.json({ user });
  });

  router.post('/sign-out', { roles: 'signed-in' }, async (req, res) => {
    await promisify(req.logout.bind(req))();
    await promisify(req.session.destroy.bind(req.session))();
    res.clearCookie(sessionCookieName, { path: '/' });
    res.clearCookie(csrfCookieName, { path: '/' });
    res.status(204).end();
  });

  router.post('/password', { roles: 'signed-in' }, async (req, res) => {
    const input = parseInput(changePasswordSchema, req.body, 'password change');
    await changeOwnPassword(context, req.user!.id, input.currentPassword, input.newPassword);
    res.status(204).end();
  });

  router.patch('/preferences', { roles: 'signed-in' }, async (req, res) => {
    const input = parseInput(preferencesSchema, req.body, 'preferences');
    res.json({ user: await updatePreferences(context, req.user!.id, input.displayUnit) });
  });

  return router;
}
