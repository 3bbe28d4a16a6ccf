// Reads a whole logger file held in memory: for the CLI, tests and the upload preview.
import { LogReader, type LogReadResult } from './log-reader.js';
import type { LogMapping } from './log-layout.js';
import { requireLayout } from './require-layout.js';
import { sniffLog } from './sniff-log.js';
import { splitLines } from './split-lines.js';

/** Throws LogFileError when the layout cannot be settled or fewer than two rows can be read. */
export function readLogText(text: string, mapping: LogMapping = {}): LogReadResult {
  const lines = splitLines(text);
  const layout = requireLayout(sniffLog(lines, mapping));
  const reader = new LogReader(layout);
  for (const line of lines) reader.pushLine(line);
  return reader.finish();
}
