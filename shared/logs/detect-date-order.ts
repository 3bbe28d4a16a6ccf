// Tells day-first from month-first dates by the first value whose day is above 12.
import type { DateOrder } from './log-layout.js';

const LEADING_DATE = /^\s*(\d{1,4})[-/.](\d{1,2})[-/.]\d{1,4}/;

/** Undefined while every date seen could be read either way. */
export function detectDateOrder(values: Iterable<string | undefined>): DateOrder | undefined {
  for (const value of values) {
    const m = value === undefined ? null : LEADING_DATE.exec(value);
    if (!m) continue;
    if (m[1].length > 2) return 'YMD';
    if (Number(m[1]) > 12) return 'DMY';
    if (Number(m[2]) > 12) return 'MDY';
  }
  return undefined;
}
