// A temperature kept as the user entered it, so it can be shown back unchanged; compare through °C.
import { toCelsius } from './convert-temperature.js';
import type { TemperatureUnit } from './temperature-unit.js';

export interface Temperature {
  readonly value: number;
  readonly unit: TemperatureUnit;
}

export function temperatureInCelsius(temperature: Temperature): number {
  return toCelsius(temperature.value, temperature.unit);
}
