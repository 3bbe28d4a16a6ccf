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
import { fileLines, MAX_LINE_CHARS } from './file-lines.js';
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
  let firstOverlong = 0;
  for await (const { lines, overlong } of fileLines(path)) {
    // A line too long to be a row is read as blank here, and named if the file then cannot be read.
    for (const index of overlong ?? []) {
      if (head.length + index >= SNIFF_LINES) break;
      lines[index] = '';
      firstOverlong ||= head.length + index + 1;
    }
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
  if (sniff.needs.length && firstOverlong) {
    throw new LogFileError(`line ${firstOverlong} is longer than ${MAX_LINE_CHARS.toLocaleString('en-US')} characters, which no logger row is`);
  }
  if (sniff.needs.includes('header')) {
    const what = documentKind(head);
    if (what) throw new LogFileError(`it looks like ${what}, not a logger export: no header row and no readings found`);
  }
  return requireLayout(sniff);
}

/** Text files that are plainly something else, to say so rather than only that no header was found. */
function documentKind(head: readonly string[]): string | undefined {
  const start = head.find((line) => line.trim() !== '')?.trimStart() ?? '';
  if (/^<(!doctype html|html|head|body)\b/i.test(start)) return 'a web page (HTML)';
  if (start.startsWith('<?xml') || start.startsWith('<')) return 'an XML document';
  if (start.startsWith('{') || start.startsWith('[')) return 'a JSON document';
  return undefined;
}

/** Throws LogFileError when fewer than two rows can be read. */
export async function readLogFile(path: string, layout: LogLayout, hooks: ReadHooks = {}): Promise<LogFileRead> {
  const reader = new LogReader(layout);
  let line = 0;
  let rowsRead = 0;
  let reported = 0;
  for await (const { lines, bytesRead, overlong } of fileLines(path)) {
    const batch: LogReading[] = [];
    for (let i = 0; i < lines.length; i++) {
      const text = lines[i];
      if (++line > layout.headerLine && !isBlank(text)) rowsRead++;
      if (overlong?.includes(i)) {
        reader.skipLine(`line is longer than ${MAX_LINE_CHARS.toLocaleString('en-US')} characters; row skipped`);
        continue;
      }
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
