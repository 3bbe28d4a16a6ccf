// Reads a temperature cell: a plain number, optionally with a decimal comma, a Unicode minus or a trailing unit.
import type { TemperatureUnit } from '../temperature/temperature-unit.js';

const DECORATED = /^\s*([+\-\u2212]?)(\d+(?:[.,]\d*)?|[.,]\d+)\s*(?:[°º˚]\s*)?([CF])?\s*$/i;

/** NaN when the cell is not a number; a comma is a decimal mark only when `decimalComma` says so. */
export function parseTemperatureCell(text: string, decimalComma: boolean): number {
  const plain = parsePlainDecimal(text);
  if (!Number.isNaN(plain)) return plain;
  const m = DECORATED.exec(text);
  if (!m || (!decimalComma && m[2].includes(','))) return NaN;
  const magnitude = Number(m[2].replace(',', '.'));
  return m[1] === '' || m[1] === '+' ? magnitude : -magnitude;
}

/**
 * `-12.5`, `40`, `4.25` by character codes: the shape nearly every cell has. NaN for anything else.
 * Exact integers divided by an exact power of ten round once, so this equals Number(text).
 */
function parsePlainDecimal(text: string): number {
  const n = text.length;
  let i = text.charCodeAt(0) === 45 ? 1 : 0;
  if (i >= n || n - i > 15) return NaN;
  let digits = 0;
  let scale = 1;
  let point = false;
  for (; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      digits = digits * 10 + (c - 48);
      if (point) scale *= 10;
    } else if (c === 46 && !point && i > 0 && i < n - 1 && text.charCodeAt(i - 1) !== 45) point = true;
    else return NaN;
  }
  const value = digits / scale;
  return text.charCodeAt(0) === 45 ? -value : value;
}

/** The unit written after the number in a cell such as `4.5 °C`, if any. */
export function temperatureCellUnit(text: string): TemperatureUnit | undefined {
  const unit = DECORATED.exec(text)?.[3];
  return unit === undefined ? undefined : (unit.toUpperCase() as TemperatureUnit);
}
