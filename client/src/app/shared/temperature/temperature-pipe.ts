// Shows a temperature in the signed-in user's unit (°F or °C), whatever unit it was stored in.
import { Pipe, PipeTransform, inject } from '@angular/core';
import { fromCelsius, toCelsius, type TemperatureUnit } from '@shared/temperature/index.js';
import { AuthStore } from '../../core/auth/auth-store';

export function formatTemperature(valueC: number, unit: TemperatureUnit, digits = 1): string {
  return `${fromCelsius(valueC, unit).toFixed(digits)} °${unit}`;
}

/**
 * `{{ reading.tempC | temperature }}` for a value in °C, or `{{ value | temperature: 'F' }}` for one entered in °F.
 * Impure on purpose: it follows the user's unit when they change it.
 */
@Pipe({ name: 'temperature', pure: false })
export class TemperaturePipe implements PipeTransform {
  private readonly auth = inject(AuthStore);

  transform(value: number | null | undefined, storedIn: TemperatureUnit = 'C', digits = 1): string {
    if (value == null || !Number.isFinite(value)) return '—';
    return formatTemperature(toCelsius(value, storedIn), this.auth.displayUnit(), digits);
  }
}
