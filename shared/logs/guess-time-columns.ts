// Chooses the timestamp column, or a date column and a time column, by their cells and then their headers.
import { dateTimeHeaderScore, isDateHeader, isTimeOfDayHeader } from './header-keywords.js';
import type { SniffedColumn } from './sniffed-column.js';

export interface TimeColumns {
  readonly timeColumn?: number;
  readonly dateColumn?: number;
}

function best(columns: readonly SniffedColumn[], score: (c: SniffedColumn) => number): number | undefined {
  let chosen: SniffedColumn | undefined;
  for (const c of columns) if (!chosen || score(c) > score(chosen)) chosen = c;
  return chosen?.index;
}

/** Empty when no column holds dates. A fixed `dateColumn` or `timeColumn` from the user is kept and the other found. */
export function guessTimeColumns(columns: readonly SniffedColumn[], fixed: TimeColumns = {}): TimeColumns {
  const ofKind = (kind: SniffedColumn['kind']) => columns.filter((c) => c.kind === kind);
  const fixedTime = fixed.timeColumn === undefined ? undefined : columns[fixed.timeColumn];
  if (fixed.dateColumn === undefined && fixedTime?.kind !== 'time') {
    if (fixedTime) return { timeColumn: fixedTime.index };
    const combined = best(ofKind('datetime'), (c) => dateTimeHeaderScore(c.name));
    if (combined !== undefined) return { timeColumn: combined };
  }
  const dateColumn = fixed.dateColumn ?? best(ofKind('date'), (c) => (isDateHeader(c.name) ? 1 : 0));
  const timeColumn = fixed.timeColumn ?? best(ofKind('time'), (c) => (isTimeOfDayHeader(c.name) ? 1 : 0));
  return dateColumn === undefined ? {} : { dateColumn, timeColumn };
}
