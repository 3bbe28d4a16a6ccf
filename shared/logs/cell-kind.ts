// What a single cell looks like, which is how columns are found when their headers do not say.
import { parseTemperatureCell } from './parse-temperature-cell.js';
import { DATE_PATTERN, DATE_TIME_PATTERN, TIME_PATTERN } from './timestamp-patterns.js';

export type CellKind = 'datetime' | 'date' | 'time' | 'number' | 'text' | 'empty';

export function cellKind(text: string): CellKind {
  if (text.trim() === '') return 'empty';
  if (DATE_TIME_PATTERN.test(text)) return 'datetime';
  if (DATE_PATTERN.test(text)) return 'date';
  if (TIME_PATTERN.test(text)) return 'time';
  if (!Number.isNaN(parseTemperatureCell(text, true))) return 'number';
  return 'text';
}

/** A row that could be a reading: it has a date (alone or with a time) and a number. */
export function isReadingRow(fields: readonly string[]): boolean {
  if (fields.length < 2) return false;
  const kinds = fields.map(cellKind);
  return kinds.includes('number') && (kinds.includes('datetime') || kinds.includes('date'));
}

/** A row with a date in it, readable or not; the header is the first line above the data without one. */
export function hasDateCell(fields: readonly string[]): boolean {
  return fields.some((f) => DATE_TIME_PATTERN.test(f) || DATE_PATTERN.test(f));
}
