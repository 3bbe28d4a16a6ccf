// Which side of a range a °C reading falls on; a reading on a limit counts as in range.
import type { CelsiusLimits } from './temperature-range.js';

/** Limits entered in °F become repeating decimals in °C; this keeps 45.0 °F inside a 45 °F limit. */
export const LIMIT_TOLERANCE_C = 0.001;

export type RangeSide = 'in' | 'high' | 'low';

export function classifyTemperatureC(tempC: number, limits: CelsiusLimits): RangeSide {
  if (tempC > limits.highC + LIMIT_TOLERANCE_C) return 'high';
  if (tempC < limits.lowC - LIMIT_TOLERANCE_C) return 'low';
  return 'in';
}
