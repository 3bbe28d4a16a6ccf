// Public surface of the temperature module, shared by the API, the CLI and the browser client.
export { parseTemperatureUnit, type TemperatureUnit } from './temperature-unit.js';
export {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  fahrenheitToKelvin,
  fromCelsius,
  kelvinToCelsius,
  KELVIN_AT_ZERO_CELSIUS,
  toCelsius,
} from './convert-temperature.js';
export { temperatureInCelsius, type Temperature } from './temperature.js';
export { rangeInCelsius, type CelsiusLimits, type TemperatureRange } from './temperature-range.js';
export { classifyTemperatureC, LIMIT_TOLERANCE_C, type RangeSide } from './classify-temperature.js';
export { DEFAULT_STORAGE_RANGE } from './default-storage-range.js';
