// Picks the delimiter under which the most lines split into a date and a number.
import type { LogDelimiter } from './log-layout.js';
import { hasDateCell, isReadingRow } from './cell-kind.js';
import { splitCsvLine } from './split-csv-line.js';

// A `;` file with decimal commas also splits on `,`, but then no piece is a whole date, so it scores nothing.
const CANDIDATES: readonly LogDelimiter[] = [',', ';', '\t'];

/** Rows with a date and a number decide; failing any, rows with a date and another field. */
export function detectDelimiter(lines: readonly string[]): LogDelimiter | undefined {
  let best: LogDelimiter | undefined;
  let bestScore = 0;
  for (const delimiter of CANDIDATES) {
    let score = 0;
    for (const line of lines) {
      const fields = splitCsvLine(line, delimiter);
      if (isReadingRow(fields)) score += lines.length + 1;
      else if (fields.length >= 2 && hasDateCell(fields)) score += 1;
    }
    if (score > bestScore) [best, bestScore] = [delimiter, score];
  }
  return best;
}
