// Takes just the needed cells out of a CSV line, without splitting the whole line into an array.
import { splitCsvLine } from './split-csv-line.js';

/**
 * After `pick(line)` returns true, `cells[k]` is the cell of column `columns[k]`.
 * Quoted lines go through the full splitter; the rest are cut with indexOf, which saves most of
 * the garbage a split per row would make on a file of half a million rows.
 */
export class CellPicker {
  readonly cells: string[];
  private readonly last: number;

  constructor(
    private readonly delimiter: string,
    private readonly columns: readonly number[],
  ) {
    this.cells = columns.map(() => '');
    this.last = Math.max(...columns);
  }

  /** False when the line has too few fields for the chosen columns. */
  pick(line: string): boolean {
    if (line.indexOf('"') !== -1) return this.pickFields(splitCsvLine(line, this.delimiter));
    const { columns, cells, delimiter } = this;
    let start = 0;
    for (let column = 0; column <= this.last; column++) {
      if (start > line.length) return false;
      let end = line.indexOf(delimiter, start);
      if (end === -1) end = line.length;
      for (let k = 0; k < columns.length; k++) if (columns[k] === column) cells[k] = line.substring(start, end);
      start = end + 1;
    }
    return true;
  }

  pickFields(fields: readonly string[]): boolean {
    if (fields.length <= this.last) return false;
    for (let k = 0; k < this.columns.length; k++) this.cells[k] = fields[this.columns[k]];
    return true;
  }
}
