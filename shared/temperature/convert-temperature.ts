// Exact scale conversions (NIST SP 811 §4.2.1.1 and appendix B.9): t/°C = (t/°F − 32)/1.8, T/K = t/°C + 273.15.
import type { TemperatureUnit } from './temperature-unit.js';

export const KELVIN_AT_ZERO_CELSIUS = 273.15;

export function fahrenheitToCelsius(fahrenheit: number): number {
  return (fahrenheit - 32) / 1.8;
}

export function celsiusToFahrenheit(celsius: number): number {
  return celsius * 1.8 + 32;
}

export function celsiusToKelvin(celsius: number): number {
  return celsius + KELVIN_AT_ZERO_CELSIUS;
}

export function kelvinToCelsius(kelvin: number): number {
  return kelvin - KELVIN_AT_ZERO_CELSIUS;
}

/** Direct rather than through °C, so absolute zero comes out as exactly 0 K. */
export function fahrenheitToKelvin(fahrenheit: number): number {
  return (fahrenheit + 459.67) / 1.8;
}

export function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'F' ? fahrenheitToCelsius(value) : value;
}

export function fromCelsius(celsius: number, unit: TemperatureUnit): number {
  return unit === 'F' ? celsiusToFahrenheit(celsius) : celsius;
}
