// Finds the header row: the nearest line above the first run of readings that has no date in it.
import { hasDateCell, isReadingRow } from './cell-kind.js';

const hasDates = (fields: readonly string[]) => fields.length >= 2 && hasDateCell(fields);

/** 0-based index into `rows`, or undefined when there is no such line (the file starts with data, or has none). */
export function findHeaderLine(rows: readonly (readonly string[])[]): number | undefined {
  const filled = rows.map((fields, index) => ({ fields, index })).filter(({ fields }) => fields.join('').trim() !== '');
  // Rows with dates but no number still show where the header is, so the error can say the temperature is missing.
  const isData = filled.some(({ fields }) => isReadingRow(fields)) ? isReadingRow : hasDates;
  // Two readings in a row, so that one metadata line such as "Start,2026-03-01 08:00,1" is not taken for data.
  let first = filled.findIndex(
    ({ fields }, i) => isData(fields) && (i === filled.length - 1 || isData(filled[i + 1].fields)),
  );
  if (first === -1) first = filled.findIndex(({ fields }) => isData(fields));
  if (first === -1) return undefined;
  for (let i = first - 1; i >= 0; i--) {
    const { fields, index } = filled[i];
    if (hasDateCell(fields)) continue;
    return fields.length >= 2 ? index : undefined;
  }
  return undefined;
}
