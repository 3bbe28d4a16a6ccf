// The monthly fridge record as CSV: one row per day, then the month's excursions below a blank line.
import type { MonthlyRecord } from '../../shared/fridges/monthly-record.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { durationText, localTime, statusText, tempText } from './record-formatting.js';

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
    row(['date', `min ${u}`, `max ${u}`, 'readings', 'checks (time initials current min max)']),
    ...record.days.map((d) =>
      row([
        d.date,
        tempText(d.minC, unit),
        tempText(d.maxC, unit),
        d.readings,
        d.checks.map((c) => [c.time, c.initials, tempText(c.currentC, unit), tempText(c.minC, unit), tempText(c.maxC, unit)].filter(Boolean).join(' ')).join('; '),
      ]),
    ),
    '',
    row(['excursion', 'start', 'end', 'duration', `peak ${u}`, 'status', 'what was done']),
    ...record.excursions.map((e) =>
      row([e.kind, localTime(e.start, record.fridge.timeZone), localTime(e.end, record.fridge.timeZone), durationText(e.minutes), tempText(e.peakC, unit), statusText[e.status] ?? e.status, e.actionTaken]),
    ),
  ];
  return `\ufeff${lines.join('\r\n')}\r\n`;
}
