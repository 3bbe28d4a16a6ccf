// An allowed storage range kept "as entered" (e.g. 35–45 °F), and its limits in °C for comparisons.
import { toCelsius } from './convert-temperature.js';
import type { TemperatureUnit } from './temperature-unit.js';

export interface TemperatureRange {
  readonly low: number;
  readonly high: number;
  readonly unit: TemperatureUnit;
}

export interface CelsiusLimits {
  readonly lowC: number;
  readonly highC: number;
}

export function rangeInCelsius(range: TemperatureRange): CelsiusLimits {
  return { lowC: toCelsius(range.low, range.unit), highC: toCelsius(range.high, range.unit) };
}
