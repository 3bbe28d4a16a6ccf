// Route parameters: a numeric id that is not a positive integer is a 404, never a database error.
import { AppError } from './app-error.js';

export function parseIdParam(value: string | string[] | undefined): number {
  const text = Array.isArray(value) ? value[0] : value;
  if (!text || !/^[1-9]\d{0,9}$/.test(text) || Number(text) > 2_147_483_647) throw AppError.notFound();
  return Number(text);
}
