// A router whose every route must declare its access; the declarations form the catalogue the role matrix test reads.
import express, { type RequestHandler, type Router } from 'express';
import { accessGuard, type Access } from './access.js';
import { csrfProtection } from './csrf.js';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteEntry {
  method: Method;
  path: string;
  access: Access;
}

/** Every route declared through a secure router, by full path. */
export const routeCatalog: RouteEntry[] = [];

const unsafeMethods = new Set<Method>(['post', 'put', 'patch', 'delete']);

export interface SecureRouter {
  readonly prefix: string;
  readonly express: Router;
  get(path: string, access: Access, ...handlers: RequestHandler[]): void;
  post(path: string, access: Access, ...handlers: RequestHandler[]): void;
  put(path: string, access: Access, ...handlers: RequestHandler[]): void;
  patch(path: string, access: Access, ...handlers: RequestHandler[]): void;
  delete(path: string, access: Access, ...handlers: RequestHandler[]): void;
}

export function createSecureRouter(prefix: string): SecureRouter {
  const router = express.Router();
  const add = (method: Method) => (path: string, access: Access, ...handlers: RequestHandler[]) => {
    const fullPath = `${prefix}${path === '/' ? '' : path}`;
    if (!routeCatalog.some((r) => r.method === method && r.path === fullPath)) {
      routeCatalog.push({ method, path: fullPath, access });
    }
    // Access first (401/403/404 say nothing about the request), then CSRF on state-changing calls.
    const chain = unsafeMethods.has(method) ? [accessGuard(access), csrfProtection, ...handlers] : [accessGuard(access), ...handlers];
    router[method](path, ...chain);
  };
  return {
    prefix,
    express: router,
    get: add('get'),
    post: add('post'),
    put: add('put'),
    patch: add('patch'),
    delete: add('delete'),
  };
}
