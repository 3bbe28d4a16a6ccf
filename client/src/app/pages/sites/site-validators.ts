// The site form's checks, mirroring the schema's limits; each failure carries the words shown under its field.
import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { controlMessage } from '../../core/forms/server-errors';
import { expiryWindowLimits, siteCodePattern, siteNameMaxLength, type SettingLimit } from './site-setting-limits';

const grouped = new Intl.NumberFormat('en-US');

/** "Between 1 and 1,440 minutes." — the range in the words the hint and the error share. */
export function rangeText(limit: { min: number; max: number }, unit: string): string {
  return `Between ${grouped.format(limit.min)} and ${grouped.format(limit.max)} ${unit}.`;
}

/** A number within the limit; empty counts as missing unless `optional`. */
export function settingValidator(limit: SettingLimit, optional = false): ValidatorFn {
  return (control: AbstractControl<number | null>): ValidationErrors | null => {
    const value = control.value;
    if (value === null || (value as unknown) === '') return optional ? null : { required: 'Required.' };
    if (!Number.isFinite(value) || value < limit.min || value > limit.max) return { range: rangeText(limit, limit.unit) };
    if (limit.integer && !Number.isInteger(value)) return { integer: `A whole number of ${limit.unit}.` };
    return null;
  };
}

export function siteCodeValidator(control: AbstractControl<string>): ValidationErrors | null {
  return siteCodePattern.test(control.value.trim()) ? null : { code: '2–16 letters, digits or dashes.' };
}

export function siteNameValidator(control: AbstractControl<string>): ValidationErrors | null {
  const name = control.value.trim();
  if (!name) return { name: 'Enter a name.' };
  return name.length > siteNameMaxLength ? { name: `At most ${siteNameMaxLength} characters.` } : null;
}

export function isTimeZone(zone: string): boolean {
  if (!zone) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export function timeZoneValidator(control: AbstractControl<string>): ValidationErrors | null {
  return isTimeZone(control.value.trim()) ? null : { timeZone: 'Not a time zone Vialyard knows: pick one from the list (e.g. America/Chicago).' };
}

/** Reads "30, 60, 90" into day counts, or says what is wrong with the list. */
export function parseDayList(text: string): number[] | { problem: string } {
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  if (parts.length === 0) return { problem: 'Enter at least one window, e.g. 30.' };
  if (parts.some((part) => !/^\d+$/.test(part))) return { problem: 'Whole numbers of days, separated by commas.' };
  const days = parts.map(Number);
  const { min, max, most } = expiryWindowLimits;
  if (days.length > most) return { problem: `At most ${most} windows.` };
  if (days.some((d) => d < min || d > max)) return { problem: `Each window between ${min} and ${max} days.` };
  if (days.some((d, i) => i > 0 && d <= days[i - 1]!)) return { problem: 'List the windows from the shortest up, each longer than the one before.' };
  return days;
}

export function dayListValidator(control: AbstractControl<string>): ValidationErrors | null {
  const parsed = parseDayList(control.value);
  return Array.isArray(parsed) ? null : { days: parsed.problem };
}

/** The server's words when it sent some, else the failed check's own words. */
export function fieldMessage(control: AbstractControl): string {
  const errors = control.errors ?? {};
  const own = Object.values(errors).find((value): value is string => typeof value === 'string');
  return typeof errors['server'] === 'string' ? errors['server'] : own ?? controlMessage(control);
}
