// Chooses the temperature column: by its header if one says so, otherwise the only plausible numeric column.
import { parseTemperatureCell } from './parse-temperature-cell.js';
import { isExcludedHeader, isTemperatureHeader } from './header-keywords.js';
import type { SniffedColumn } from './sniffed-column.js';
import { unitFromHeader } from './unit-from-header.js';

export interface TempColumnGuess {
  /** The choice, or the first candidate when `ambiguous`. */
  readonly column?: number;
  readonly ambiguous: boolean;
}

/** Row counters and 0/1 flags are numeric but never a temperature. */
function looksLikeCounterOrFlag(values: readonly number[]): boolean {
  if (values.length < 2) return false;
  if (values.every((v) => v === 0 || v === 1)) return true;
  return values.every((v, i) => i === 0 || v === values[i - 1] + 1);
}

export function guessTempColumn(
  columns: readonly SniffedColumn[],
  rows: readonly (readonly string[])[],
  timeColumns: readonly number[],
): TempColumnGuess {
  const numeric = columns.filter((c) => c.kind === 'number' && !timeColumns.includes(c.index));
  const named = numeric.filter(
    (c) => (isTemperatureHeader(c.name) || unitFromHeader(c.name) !== undefined) && !isExcludedHeader(c.name),
  );
  if (named.length > 0) return { column: named[0].index, ambiguous: named.length > 1 };
  const byValues = numeric.filter((c) => {
    if (isExcludedHeader(c.name)) return false;
    const values = rows.map((r) => parseTemperatureCell(r[c.index] ?? '', true)).filter((v) => !Number.isNaN(v));
    return !looksLikeCounterOrFlag(values);
  });
  return { column: byValues[0]?.index, ambiguous: byValues.length > 1 };
}
