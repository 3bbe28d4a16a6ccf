// Parses request input with a shared zod schema; a failure becomes a 400 that names each field.
import type { z } from 'zod';
import { AppError } from './app-error.js';
import { nulTextError, nulTextPath } from './refuse-nul-text.js';

export function parseInput<S extends z.ZodType>(schema: S, input: unknown, what = 'request'): z.infer<S> {
  // JSON bodies are checked on arrival; this catches JSON sent inside a multipart field.
  const nul = nulTextPath(input);
  if (nul !== undefined) throw nulTextError(nul || what);
  const parsed = schema.safeParse(input ?? {});
  if (parsed.success) return parsed.data;
  const fields = parsed.error.issues.map((issue) => ({
    field: issue.path.join('.') || what,
    message: issue.message,
  }));
  const summary = fields.map((f) => `${f.field}: ${f.message}`).join('; ');
  throw AppError.badRequest(`The ${what} is not valid: ${summary}`, fields);
}
