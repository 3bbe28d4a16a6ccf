// Refuses request text holding a NUL character: PostgreSQL text cannot store one, so it would otherwise end as a 500.
import type { NextFunction, Request, Response } from 'express';
import { AppError } from './app-error.js';

/** The path (`lines.0.notes`) of the first string or key with a NUL in it, '' for the value itself, undefined for none. */
export function nulTextPath(value: unknown, path = '', depth = 0): string | undefined {
  if (typeof value === 'string') return value.includes('\u0000') ? path : undefined;
  if (!value || typeof value !== 'object' || depth > 32) return undefined;
  for (const [key, inner] of Object.entries(value)) {
    const here = path ? `${path}.${key}` : key;
    if (key.includes('\u0000')) return here;
    const found = nulTextPath(inner, here, depth + 1);
    if (found !== undefined) return found;
  }
  return undefined;
}

export function nulTextError(field: string): AppError {
  return AppError.badRequest(`${field} contains a NUL character (\\u0000), which no text field can hold.`, [{ field, message: 'Contains a NUL character.' }]);
}

/** For JSON bodies and query strings; multipart fields are checked where they are parsed (parseInput). */
export function refuseNulText(req: Request, _res: Response, next: NextFunction): void {
  const inBody = nulTextPath(req.body);
  if (inBody !== undefined) return next(nulTextError(inBody || 'body'));
  const inQuery = nulTextPath(req.query);
  if (inQuery !== undefined) return next(nulTextError(inQuery || 'query'));
  next();
}
