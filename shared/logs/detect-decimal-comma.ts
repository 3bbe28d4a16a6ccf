// Tells whether temperature cells use a decimal comma (`4,5`), as many European exports do.

const DECIMAL_COMMA = /^\s*[+\-\u2212]?\d+,\d+/;
const DECIMAL_POINT = /^\s*[+\-\u2212]?\d*\.\d+/;

/** A single cell written with a point rules the comma out, so `1,000`-style oddities are not misread. */
export function detectDecimalComma(cells: readonly string[]): boolean {
  return cells.some((c) => DECIMAL_COMMA.test(c)) && !cells.some((c) => DECIMAL_POINT.test(c));
}
