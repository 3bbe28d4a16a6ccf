// How the monthly record writes temperatures, times, counts and durations, the same in its PDF and its CSV.
import { fromCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import type { MonthlyRecord, MonthlyRecordDay } from '../../shared/fridges/monthly-record.js';
import { formatSiteTime } from '../pdf/site-time.js';

export function tempText(valueC: number | null, unit: TemperatureUnit): string {
  return valueC === null ? '' : fromCelsius(valueC, unit).toFixed(1);
}

/** An instant of the record on the site's clock, with the zone's short name (the PDFs' one formatter). */
export function recordTime(iso: string, record: MonthlyRecord): string {
  return formatSiteTime(iso, record.fridge.timeZone);
}

export function durationText(minutes: number | null): string {
  if (minutes === null) return 'unknown (found at a check)';
  const whole = Math.round(minutes);
  const hours = Math.floor(whole / 60);
  return hours ? `${hours} h ${whole % 60} min` : `${whole} min`;
}

/** The day's time without readings; empty for a day before the fridge's first reading, which is not counted. */
export function dayWithoutText(day: MonthlyRecordDay): string {
  return day.minutesWithoutReadings === null ? '' : durationText(day.minutesWithoutReadings);
}

/** The day's readings, saying how many came from the backup logger (which reads less often than the primary). */
export function dayReadingsText(day: MonthlyRecordDay): string {
  if (day.minutesWithoutReadings === null && day.readings === 0) return '';
  return day.backupReadings ? `${day.readings} (${day.backupReadings} backup)` : String(day.readings);
}

/** The words the app uses for an excursion's kind. */
export const kindText: Record<'high' | 'low', string> = { high: 'too warm', low: 'too cold' };

export const statusText: Record<string, string> = { open: 'open', in_review: 'in review', decided: 'decided' };

/** The month's lines above the table: what it covers, where readings start or stop, the time without readings. */
export function coverageLines(record: MonthlyRecord): string[] {
  const lines: string[] = [];
  if (record.countedFrom === null) {
    lines.push('No reading of this fridge is stored for this period, so no time without readings is counted.');
    return lines;
  }
  if (record.readingsStart !== null) {
    lines.push(`Readings start ${recordTime(record.readingsStart, record)}; the days before are not counted as time without readings.`);
  }
  const span = record.inProgress ? `from ${record.month}-01 to ${recordTime(record.generatedAt, record)}` : 'this month';
  let without = `Time without readings ${span}: ${durationText(record.gapMinutes)}`;
  if (record.lastReading !== null && record.minutesAfterLastReading > 0) {
    const part = Math.round(record.minutesAfterLastReading) === Math.round(record.gapMinutes) ? 'all of it' : `of which ${durationText(record.minutesAfterLastReading)}`;
    without += `, ${part} since the last stored reading (${recordTime(record.lastReading, record)})`;
    if (record.inProgress) without += '; the logger\'s next file may fill that time';
  }
  lines.push(`${without}.`);
  return lines;
}
