// How the monthly record writes temperatures, times and durations, the same in its PDF and its CSV.
import { DateTime } from 'luxon';
import { fromCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';

export function tempText(valueC: number | null, unit: TemperatureUnit): string {
  return valueC === null ? '' : fromCelsius(valueC, unit).toFixed(1);
}

export function localTime(iso: string, zone: string): string {
  return DateTime.fromISO(iso, { zone }).toFormat('yyyy-MM-dd HH:mm');
}

export function durationText(minutes: number | null): string {
  if (minutes === null) return 'unknown (found at a check)';
  const whole = Math.round(minutes);
  const hours = Math.floor(whole / 60);
  return hours ? `${hours} h ${whole % 60} min` : `${whole} min`;
}

export const statusText: Record<string, string> = { open: 'open', in_review: 'in review', decided: 'decided' };
