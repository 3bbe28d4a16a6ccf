// Reads the temperature unit from a column header: `°F`, `(F)`, `degF`, `temp_f`, `Celsius`, ...
import type { TemperatureUnit } from '../temperature/temperature-unit.js';
import { normalizeHeader } from './header-keywords.js';

function unitPattern(letter: string, names: string): RegExp {
  return new RegExp(
    [
      String.raw`[°º˚]\s*${letter}(?![a-z])`,
      String.raw`\(\s*${letter}\s*\)`,
      String.raw`\[\s*${letter}\s*\]`,
      String.raw`\b(?:deg(?:rees?)?|grad(?:e|en|es|os)?)[\s_.-]*${letter}(?![a-z])`,
      String.raw`(?:^|[\s_.-])${letter}$`,
      names,
    ].join('|'),
  );
}

const FAHRENHEIT = unitPattern('f', 'fahrenheit|℉');
const CELSIUS = unitPattern('c', 'celsius|centigrad|℃');

/** Undefined when the header names neither unit, or both. */
export function unitFromHeader(header: string): TemperatureUnit | undefined {
  const text = normalizeHeader(header);
  const f = FAHRENHEIT.test(text);
  const c = CELSIUS.test(text);
  if (f === c) return undefined;
  return f ? 'F' : 'C';
}
