// Resolves a column the user named (header text, any case and accents) or numbered (0-based).
import { normalizeHeader } from './header-keywords.js';

export function findColumn(header: readonly string[], ref: string | number): number | undefined {
  if (typeof ref === 'number') return Number.isInteger(ref) && ref >= 0 ? ref : undefined;
  const wanted = normalizeHeader(ref);
  const index = header.findIndex((name) => normalizeHeader(name) === wanted);
  return index === -1 ? undefined : index;
}
