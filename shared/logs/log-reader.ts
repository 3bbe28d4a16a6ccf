// Reads a logger file one line (or one parsed record) at a time, so big files can be streamed.
import { fahrenheitToCelsius } from '../temperature/convert-temperature.js';
import { LocalTimeResolver } from './local-time-resolver.js';
import { LogFileError } from './log-file-error.js';
import type { LogLayout } from './log-layout.js';
import type { LogReading } from './log-reading.js';
import type { LogWarning } from './log-warning.js';
import { orderReadings } from './order-readings.js';
import { parseTemperatureCell, temperatureCellUnit } from './parse-temperature-cell.js';
import { TimestampParser } from './parse-timestamp.js';
import { CellPicker } from './cell-picker.js';
import { splitCsvLine } from './split-csv-line.js';
import { isBlank } from './is-blank.js';

/** Readings outside this span (in °C) are skipped: the database refuses them too. */
export const PLAUSIBLE_LOW_C = -100;
export const PLAUSIBLE_HIGH_C = 200;

/** Warnings kept in full (the first, by line); `warningCount` counts them all, so a file of bad lines cannot fill memory. */
export const KEPT_READ_WARNINGS = 1000;

export interface LogReadResult {
  readonly layout: LogLayout;
  /** Sorted by time, one per instant. */
  readonly readings: readonly LogReading[];
  /** Data rows not used: unreadable ones and repeated timestamps. */
  readonly skipped: number;
  /** The first KEPT_READ_WARNINGS warnings by line. */
  readonly warnings: readonly LogWarning[];
  /** Every warning, kept or not. */
  readonly warningCount: number;
}

/** A cell as a warning quotes it: control characters (a NUL cannot be stored in JSON text) shown as �, at most 40 characters. */
function quoted(text: string): string {
  const printable = text.replace(/[\u0000-\u001f\u007f]/g, '\ufffd');
  return `'${printable.length > 40 ? `${printable.slice(0, 40)}…` : printable}'`;
}

function wallText(wallMs: number): string {
  return new Date(wallMs).toISOString().slice(0, 16).replace('T', ' ');
}

/**
 * Feed it with `pushLine` (raw lines, counted from 1) or `pushRecord` (fields from a CSV parser, with
 * their line number); lines up to the header are ignored. Each returns the reading the row gave, if any.
 * Readings are also kept, so that `finish` can sort them and drop repeated timestamps.
 */
export class LogReader {
  private readonly picker: CellPicker;
  private readonly parser: TimestampParser;
  private readonly resolver: LocalTimeResolver;
  private readonly toCelsius: (value: number) => number;
  private readonly readings: LogReading[] = [];
  private readonly warnings: LogWarning[] = [];
  private lineCount = 0;
  private skipped = 0;
  private warningCount = 0;
  private latest = -Infinity;
  private firstOutOfOrderLine = 0;

  constructor(readonly layout: LogLayout) {
    const { timeColumn, dateColumn, tempColumn } = layout;
    this.picker = new CellPicker(layout.delimiter, [tempColumn, timeColumn, dateColumn ?? timeColumn]);
    this.parser = new TimestampParser(layout.dateOrder);
    try {
      this.resolver = new LocalTimeResolver(layout.zone);
    } catch (error) {
      throw new LogFileError((error as Error).message, ['zone']);
    }
    this.toCelsius = layout.unit === 'F' ? fahrenheitToCelsius : (value) => value;
  }

  pushLine(text: string): LogReading | undefined {
    const line = ++this.lineCount;
    if (line <= this.layout.headerLine) return undefined;
    const body = text.charCodeAt(text.length - 1) === 13 ? text.slice(0, -1) : text;
    if (isBlank(body)) return undefined;
    if (this.picker.pick(body)) return this.readCells(line);
    return this.tooShort(splitCsvLine(body, this.layout.delimiter), line);
  }

  /** Counts a line that cannot be given to the reader (e.g. too long to keep) and warns about it. */
  skipLine(message: string): undefined {
    const line = ++this.lineCount;
    return line <= this.layout.headerLine ? undefined : this.skip(line, message);
  }

  pushRecord(fields: readonly string[], line: number): LogReading | undefined {
    if (line <= this.layout.headerLine) return undefined;
    if (fields.every((f) => f.trim() === '')) return undefined;
    return this.picker.pickFields(fields) ? this.readCells(line) : this.tooShort(fields, line);
  }

  private readCells(line: number): LogReading | undefined {
    const cells = this.picker.cells;
    const tempCell = cells[0];
    const timeCell = cells[1];
    const dateCell = cells[2];
    const stamp = this.layout.dateColumn === undefined ? timeCell : `${dateCell.trim()} ${timeCell.trim()}`;
    if (!this.parser.parse(stamp)) return this.skip(line, `time ${quoted(stamp.trim())} cannot be read; row skipped`);
    const tempText = tempCell.trim();
    if (tempText === '') return this.skip(line, 'temperature is empty; row skipped');
    const value = parseTemperatureCell(tempText, this.layout.decimalComma);
    if (Number.isNaN(value)) return this.skip(line, `temperature ${quoted(tempText)} is not a number; row skipped`);
    // A cell that names its unit must name the file's: 40 °F read as 40 °C would be an excursion that never was.
    const lastCode = tempText.charCodeAt(tempText.length - 1) | 32;
    if (lastCode === 99 || lastCode === 102) {
      const cellUnit = temperatureCellUnit(tempText);
      if (cellUnit !== undefined && cellUnit !== this.layout.unit) {
        return this.skip(line, `temperature ${quoted(tempText)} is in °${cellUnit}, but the file's unit is °${this.layout.unit}; row skipped`);
      }
    }
    let at: number;
    if (Number.isNaN(this.parser.offsetMinutes)) {
      at = this.resolver.resolve(this.parser.wallMs);
      if (Number.isNaN(at)) {
        const local = wallText(this.parser.wallMs);
        const zone = this.layout.zone;
        return this.skip(line, `local time ${local} does not exist in ${zone} (clocks moved forward); row skipped`);
      }
    } else at = this.parser.wallMs - this.parser.offsetMinutes * 60_000;
    if (at < this.latest && this.firstOutOfOrderLine === 0) this.firstOutOfOrderLine = line;
    if (at > this.latest) this.latest = at;
    const tempC = this.toCelsius(value);
    // A cold-chain logger never records these; such a cell is a sentinel (e.g. -999) or a misread column.
    if (!(tempC >= PLAUSIBLE_LOW_C && tempC <= PLAUSIBLE_HIGH_C)) {
      return this.skip(line, `temperature ${quoted(tempText)} is outside what a logger records (${PLAUSIBLE_LOW_C} to ${PLAUSIBLE_HIGH_C} °C); row skipped`);
    }
    const reading: LogReading = { at, tempC, line };
    this.readings.push(reading);
    return reading;
  }

  /** Throws LogFileError when fewer than two rows could be read. */
  finish(): LogReadResult {
    const ordered = orderReadings(this.readings, this.firstOutOfOrderLine, KEPT_READ_WARNINGS);
    if (ordered.readings.length < 2) {
      throw new LogFileError(`fewer than two readable rows (found ${ordered.readings.length})`);
    }
    // Each list holds its first warnings, so the first of the two together are the file's first (by time for repeats in a sorted file).
    const warnings = [...this.warnings, ...ordered.warnings].sort((a, b) => a.line - b.line).slice(0, KEPT_READ_WARNINGS);
    return {
      layout: this.layout,
      readings: ordered.readings,
      skipped: this.skipped + ordered.dropped,
      warnings,
      warningCount: this.warningCount + ordered.warningCount,
    };
  }

  private tooShort(fields: readonly string[], line: number): undefined {
    return this.skip(line, `row has ${fields.length} fields, too few for the chosen columns; row skipped`);
  }

  private skip(line: number, message: string): undefined {
    this.skipped++;
    // Lines come in order, so the kept ones are the first.
    if (++this.warningCount <= KEPT_READ_WARNINGS) this.warnings.push({ line, message });
    return undefined;
  }
}
