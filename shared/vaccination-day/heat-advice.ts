// Heat on vaccination day: above the site's threshold, spraying is better moved to the night (common practice).
import { toCelsius } from '../temperature/convert-temperature.js';
import type { TemperatureUnit } from '../temperature/temperature-unit.js';

export interface HeatAdvice {
  tooHot: boolean;
  message: string;
}

export function heatAdvice(expected: { value: number; unit: TemperatureUnit }, threshold: { value: number; unit: TemperatureUnit }): HeatAdvice {
  const tooHot = toCelsius(expected.value, expected.unit) > toCelsius(threshold.value, threshold.unit) + 1e-9;
  return {
    tooHot,
    message: tooHot
      ? `Expected ${expected.value} °${expected.unit} is above this site's ${threshold.value} °${threshold.unit}: consider vaccinating at night, and follow the label and the veterinarian.`
      : 'Expected temperature is within this site\'s limit.',
  };
}
