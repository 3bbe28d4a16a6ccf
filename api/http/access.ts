// Who may call a route: every route declares it, and the guard enforces it before anything else runs.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Role } from '../../shared/auth/roles.js';
import { AppError } from './app-error.js';

export type Access =
  | { public: true }
  | {
      /** The roles allowed, or 'signed-in' for any signed-in user. */
      roles: readonly Role[] | 'signed-in';
      /**
       * Resolves the site a request is about (from a route parameter or the record it names);
       * a user limited to other sites gets 404, as if the record did not exist.
       */
      siteOf?: (req: Request) => Promise<number | null | undefined>;
    };

export const accessMarker = Symbol('vialyard.access');

export function canSeeSite(user: Express.User, siteId: number): boolean {
  return user.allSites || user.siteIds.includes(siteId);
}

export function accessGuard(access: Access): RequestHandler {
  const guard = async (req: Request, _res: Response, next: NextFunction) => {
    if ('public' in access) return next();
    const user = req.user;
    if (!user) throw AppError.unauthorized();
    if (access.roles !== 'signed-in' && !access.roles.some((role) => user.roles.includes(role))) {
      throw AppError.forbidden();
    }
    if (access.siteOf) {
      const siteId = await access.siteOf(req);
      if (siteId == null || !canSeeSite(user, siteId)) throw AppError.notFound();
    }
    next();
  };
  return Object.assign(guard, { [accessMarker]: access });
}
