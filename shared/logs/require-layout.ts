// Turns a sniff into a complete layout, or fails with what the user has to supply.
import { LogFileError } from './log-file-error.js';
import type { LogLayout, LogNeed } from './log-layout.js';
import type { LogSniff } from './sniff-log.js';

const NEED_MESSAGES: Record<LogNeed, string> = {
  header: 'no header row found: expected a line of column names above rows holding a date and a temperature',
  timeColumn: 'no date/time column found: choose the column holding the time of each reading',
  tempColumn: 'no temperature column found: choose the column holding the temperature',
  unit: 'temperature unit unknown: the header says neither °F nor °C, so give the unit',
  dateOrder: 'day/month order is ambiguous (no date with a day above 12): give the date order, MDY or DMY',
  zone: 'times are written without a UTC offset: give the time zone they were recorded in',
};

export function requireLayout(sniff: LogSniff): LogLayout {
  if (sniff.needs.length > 0) {
    const reasons = [...sniff.notes, ...sniff.needs.map((need) => NEED_MESSAGES[need])];
    throw new LogFileError(reasons.join('; '), sniff.needs);
  }
  return sniff.found as LogLayout;
}
