// Reads a logger file from disk as a stream: its layout from the first lines, then every line through LogReader.
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { detectDateOrder } from '../../shared/logs/detect-date-order.js';
import { LogFileError } from '../../shared/logs/log-file-error.js';
import type { LogLayout, LogMapping } from '../../shared/logs/log-layout.js';
import { LogReader, type LogReadResult } from '../../shared/logs/log-reader.js';
import type { LogReading } from '../../shared/logs/log-reading.js';
import { requireLayout } from '../../shared/logs/require-layout.js';
import { sniffLog } from '../../shared/logs/sniff-log.js';
import { splitCsvLine } from '../../shared/logs/split-csv-line.js';
import { fileLines } from './file-lines.js';
import { isBlank } from '../../shared/logs/is-blank.js';

/** As many lines as the sniffer looks at for the file's structure. */
const SNIFF_LINES = 200;

export interface LogFileRead extends LogReadResult {
  /** Non-blank lines below the header: every data row, readable or not. */
  rowsRead: number;
}

export interface ReadHooks {
  onBytes?: (bytesRead: number) => void;
  /** Each chunk's readings in file order (repeats included), awaited before the next chunk is read. */
  onReadings?: (readings: readonly LogReading[]) => Promise<void> | void;
}

export async function sha256OfFile(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path, { highWaterMark: 1024 * 1024 })) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/** The day/month order from every date in the file, for files whose first rows all read both ways. */
async function dateOrderOfFile(path: string, delimiter: string, column: number, headerLine: number) {
  const values: (string | undefined)[] = [];
  let line = 0;
  for await (const { lines } of fileLines(path)) {
    for (const text of lines) if (++line > headerLine) values.push(splitCsvLine(text, delimiter)[column]);
  }
  return detectDateOrder(values);
}

/** Throws LogFileError (the user's to fix) when the layout cannot be settled. */
export async function sniffLogFile(path: string, mapping: LogMapping): Promise<LogLayout> {
  const head: string[] = [];
  for await (const { lines } of fileLines(path)) {
    head.push(...lines.slice(0, SNIFF_LINES - head.length));
    if (head.length >= SNIFF_LINES) break;
  }
  if (head.length === 0) throw new LogFileError('the file is empty');
  let sniff = sniffLog(head, mapping);
  if (sniff.needs.length === 1 && sniff.needs[0] === 'dateOrder') {
    const found = sniff.found;
    const column = found.dateColumn ?? found.timeColumn;
    const order = column === undefined ? undefined : await dateOrderOfFile(path, found.delimiter ?? ',', column, found.headerLine ?? 1);
    if (order) sniff = sniffLog(head, { ...mapping, dateOrder: order });
  }
  return requireLayout(sniff);
}

/** Throws LogFileError when fewer than two rows can be read. */
export async function readLogFile(path: string, layout: LogLayout, hooks: ReadHooks = {}): Promise<LogFileRead> {
  const reader = new LogReader(layout);
  let line = 0;
  let rowsRead = 0;
  let reported = 0;
  for await (const { lines, bytesRead } of fileLines(path)) {
    const batch: LogReading[] = [];
    for (const text of lines) {
      if (++line > layout.headerLine && !isBlank(text)) rowsRead++;
      const reading = reader.pushLine(text);
      if (reading) batch.push(reading);
    }
    if (hooks.onReadings && batch.length) await hooks.onReadings(batch);
    if (hooks.onBytes && bytesRead - reported >= 1024 * 1024) {
      reported = bytesRead;
      hooks.onBytes(bytesRead);
    }
  }
  return { ...reader.finish(), rowsRead };
}
