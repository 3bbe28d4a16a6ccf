// How a logger file is laid out: found by the sniffer, or overridden by a mapping the user chose.
import type { TemperatureUnit } from '../temperature/temperature-unit.js';

export type LogDelimiter = ',' | ';' | '\t';

/** Only the order of day and month is ever in doubt; a four-digit first part always means YMD. */
export type DateOrder = 'MDY' | 'DMY' | 'YMD';

/** What the sniffer could not tell and a person has to choose. */
export type LogNeed = 'header' | 'timeColumn' | 'tempColumn' | 'unit' | 'dateOrder' | 'zone';

/** Everything the reader needs. Columns are 0-based indexes. */
export interface LogLayout {
  readonly delimiter: LogDelimiter;
  /** 1-based line of the column names; everything above it is metadata. */
  readonly headerLine: number;
  readonly decimalComma: boolean;
  /** The date-and-time column, or the time-of-day column when `dateColumn` is set. */
  readonly timeColumn: number;
  readonly dateColumn?: number;
  readonly tempColumn: number;
  readonly unit: TemperatureUnit;
  readonly dateOrder: DateOrder;
  /** IANA zone (or fixed offset such as `UTC-6`) for times written without an offset. */
  readonly zone: string;
}

/** A user's choices, each overriding detection. Columns by header name (case-insensitive) or 0-based index. */
export interface LogMapping {
  readonly delimiter?: LogDelimiter;
  readonly headerLine?: number;
  readonly decimalComma?: boolean;
  readonly timeColumn?: string | number;
  readonly dateColumn?: string | number;
  readonly tempColumn?: string | number;
  readonly unit?: TemperatureUnit;
  readonly dateOrder?: DateOrder;
  readonly zone?: string;
}
