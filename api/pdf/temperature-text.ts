// Temperatures and temperature-time exposure in PDFs: the reader's unit first, the other scale in brackets for
// whoever reads the printout next (records are kept in °C; many farms read °F).
import { fromCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';

const other = (unit: TemperatureUnit): TemperatureUnit => (unit === 'F' ? 'C' : 'F');
const known = (n: number | null | undefined): n is number => n !== null && n !== undefined && Number.isFinite(n);

/** "48.2 °F (9.0 °C)"; "—" when unknown. */
export function temperaturePair(valueC: number | null | undefined, unit: TemperatureUnit): string {
  if (!known(valueC)) return '—';
  return `${fromCelsius(valueC, unit).toFixed(1)} °${unit} (${fromCelsius(valueC, other(unit)).toFixed(1)} °${other(unit)})`;
}

/**
 * "128.0 °F·min (71.1 °C·min)": degrees beyond a limit times minutes is a temperature difference, so it scales by
 * 1.8 with no 32 added (NIST SP 811 §4.2.1.1: a difference of 1 °C is 1.8 °F).
 */
export function degreeMinutesPair(valueC: number | null | undefined, unit: TemperatureUnit): string {
  if (!known(valueC)) return '—';
  const inUnit = (u: TemperatureUnit) => (u === 'F' ? valueC * 1.8 : valueC).toFixed(1);
  return `${inUnit(unit)} °${unit}·min (${inUnit(other(unit))} °${other(unit)}·min)`;
}
