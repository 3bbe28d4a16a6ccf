// The monthly fridge record as CSV: one row per day, the month's excursions below a blank line, then the lines on its readings.
import type { MonthlyRecord } from '../../shared/fridges/monthly-record.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { coverageLines, dayWithoutText, durationText, kindText, recordTime, statusText, tempText } from './record-formatting.js';

function cell(value: string | number): string {
  const text = String(value);
  // Quoted when needed, and a leading formula character defused so a spreadsheet shows it as text.
  const safe = /^[=+\-@\t\r]/.test(text) && !/^-?\d/.test(text) ? `'${text}` : text;
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const row = (cells: (string | number)[]) => cells.map(cell).join(',');

export function monthlyRecordCsv(record: MonthlyRecord, unit: TemperatureUnit): string {
  const u = `°${unit}`;
  const lines = [
    row(['date', `min ${u}`, `max ${u}`, 'readings', 'of which backup', 'without readings', 'checks (time initials current min max)']),
    ...record.days.map((d) =>
      row([
        d.date,
        tempText(d.minC, unit),
        tempText(d.maxC, unit),
        d.minutesWithoutReadings === null && d.readings === 0 ? '' : d.readings,
        d.minutesWithoutReadings === null && d.readings === 0 ? '' : d.backupReadings,
        dayWithoutText(d),
        d.checks.map((c) => [c.time, c.initials, tempText(c.currentC, unit), tempText(c.minC, unit), tempText(c.maxC, unit)].filter(Boolean).join(' ')).join('; '),
      ]),
    ),
    '',
    row(['excursion', 'start', 'end', 'duration', `peak ${u}`, 'status', 'what was done']),
    ...record.excursions.map((e) =>
      row([kindText[e.kind], recordTime(e.start, record), recordTime(e.end, record), durationText(e.minutes), tempText(e.peakC, unit), statusText[e.status] ?? e.status, e.actionTaken]),
    ),
    '',
    // The same lines the PDF prints above its table, so the two copies of the record say the same.
    ...coverageLines(record).map((line) => row([line])),
  ];
  return `\ufeff${lines.join('\r\n')}\r\n`;
}
