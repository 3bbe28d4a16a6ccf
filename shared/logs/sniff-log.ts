// Works out a logger file's layout from its first lines, and says what a person still has to choose.
import { LocalTimeResolver } from './local-time-resolver.js';
import { detectDateOrder } from './detect-date-order.js';
import { detectDecimalComma } from './detect-decimal-comma.js';
import { detectDelimiter } from './detect-delimiter.js';
import { findColumn } from './find-column.js';
import { findHeaderLine } from './find-header-line.js';
import { guessTempColumn } from './guess-temp-column.js';
import { guessTimeColumns, type TimeColumns } from './guess-time-columns.js';
import type { LogLayout, LogMapping, LogNeed } from './log-layout.js';
import { hasDateCell } from './cell-kind.js';
import { describeColumns, type SniffedColumn } from './sniffed-column.js';
import { splitCsvLine } from './split-csv-line.js';
import { temperatureCellUnit } from './parse-temperature-cell.js';
import { HAS_OFFSET_PATTERN } from './timestamp-patterns.js';
import { unitFromHeader } from './unit-from-header.js';

const STRUCTURE_LINES = 200;
const SAMPLE_ROWS = 100;
const PREVIEW_LINES = 20;

export interface PreviewLine {
  /** 1-based line of the file. */
  readonly line: number;
  readonly fields: readonly string[];
}

export interface LogSniff {
  /** Everything that could be told or was given; complete when `needs` is empty. */
  readonly found: Partial<LogLayout>;
  readonly needs: readonly LogNeed[];
  /** Why a given mapping entry was not used, e.g. a column name that is not in the header. */
  readonly notes: readonly string[];
  readonly header: readonly string[];
  readonly columns: readonly SniffedColumn[];
  readonly preview: readonly PreviewLine[];
}

/**
 * `lines` must start at the file's first line (BOM and line ends already removed, see splitLines).
 * Give a sample for a preview; give every line to let the day/month order be found anywhere in the file.
 */
export function sniffLog(lines: readonly string[], mapping: LogMapping = {}): LogSniff {
  const needs: LogNeed[] = [];
  const notes: string[] = [];
  const structure = lines.slice(0, STRUCTURE_LINES);
  const delimiter = mapping.delimiter ?? detectDelimiter(structure) ?? ',';
  const rows = structure.map((line) => splitCsvLine(line, delimiter));
  const preview = rows.slice(0, PREVIEW_LINES).map((fields, i) => ({ line: i + 1, fields }));
  const headerIndex = mapping.headerLine !== undefined ? mapping.headerLine - 1 : findHeaderLine(rows);
  if (headerIndex === undefined || headerIndex < 0 || headerIndex >= rows.length) {
    return { found: { delimiter }, needs: ['header'], notes, header: [], columns: [], preview };
  }
  const header = rows[headerIndex].map((h) => h.trim());
  const sample = rows.slice(headerIndex + 1).filter(hasDateCell).slice(0, SAMPLE_ROWS);
  const columns = describeColumns(header, sample);

  const given = (ref: string | number | undefined, what: string): number | undefined => {
    if (ref === undefined) return undefined;
    const index = findColumn(header, ref);
    if (index === undefined) {
      notes.push(`${what} column '${ref}' is not in the header (line ${headerIndex + 1})`);
    }
    return index;
  };
  const fixed: TimeColumns = {
    timeColumn: given(mapping.timeColumn, 'time'),
    dateColumn: given(mapping.dateColumn, 'date'),
  };
  const time = guessTimeColumns(columns, fixed);
  const timeNotFound =
    (mapping.timeColumn !== undefined && fixed.timeColumn === undefined) ||
    (mapping.dateColumn !== undefined && fixed.dateColumn === undefined);
  if (time.timeColumn === undefined || timeNotFound) needs.push('timeColumn');
  const timeColumns = [time.timeColumn, time.dateColumn].filter((c) => c !== undefined);

  let tempColumn = given(mapping.tempColumn, 'temperature');
  if (tempColumn === undefined) {
    const guess = guessTempColumn(columns, sample, timeColumns);
    tempColumn = guess.column;
    if (guess.column === undefined || guess.ambiguous || mapping.tempColumn !== undefined) needs.push('tempColumn');
  }

  const tempCells = tempColumn === undefined ? [] : sample.map((r) => r[tempColumn] ?? '');
  const decimalComma = mapping.decimalComma ?? detectDecimalComma(tempCells);

  const valueUnits = new Set(tempCells.map(temperatureCellUnit).filter((u) => u !== undefined));
  const unit =
    mapping.unit ??
    (tempColumn === undefined ? undefined : unitFromHeader(header[tempColumn] ?? '')) ??
    (valueUnits.size === 1 ? [...valueUnits][0] : undefined);
  if (unit === undefined && tempColumn !== undefined) {
    if (valueUnits.size > 1) notes.push('the temperature cells mix °F and °C');
    needs.push('unit');
  }

  const dateCellAt = time.dateColumn ?? time.timeColumn;
  const dateCells = function* () {
    if (dateCellAt === undefined) return;
    for (let i = headerIndex + 1; i < lines.length; i++) {
      yield splitCsvLine(lines[i], delimiter)[dateCellAt];
    }
  };
  const dateOrder = mapping.dateOrder ?? detectDateOrder(dateCells());
  if (dateOrder === undefined && dateCellAt !== undefined) needs.push('dateOrder');

  const timeCells = time.timeColumn === undefined ? [] : sample.map((r) => r[time.timeColumn!] ?? '');
  // A zone only matters for times written without an offset.
  const allOffsets =
    time.dateColumn === undefined && timeCells.length > 0 && timeCells.every((c) => HAS_OFFSET_PATTERN.test(c));
  let zone = mapping.zone;
  if (zone !== undefined && !LocalTimeResolver.isKnownZone(zone)) {
    notes.push(`unknown time zone '${zone}'`);
    zone = undefined;
  }
  if (zone === undefined && allOffsets) zone = 'UTC';
  if (zone === undefined && time.timeColumn !== undefined) needs.push('zone');

  const found: Partial<LogLayout> = {
    delimiter,
    headerLine: headerIndex + 1,
    decimalComma,
    ...(time.timeColumn !== undefined && { timeColumn: time.timeColumn }),
    ...(time.dateColumn !== undefined && { dateColumn: time.dateColumn }),
    ...(tempColumn !== undefined && { tempColumn }),
    ...(unit !== undefined && { unit }),
    ...(dateOrder !== undefined && { dateOrder }),
    ...(zone !== undefined && { zone }),
  };
  return { found, needs, notes, header, columns, preview };
}

