// Which way a daily check lies outside a fridge's range: the current reading, or the minimum or maximum since reset.
import { classifyTemperatureC } from '../temperature/classify-temperature.js';
import type { CelsiusLimits } from '../temperature/temperature-range.js';

export interface CheckValuesC {
  currentC: number;
  minC: number | null;
  maxC: number | null;
}

/** One entry per side crossed, with the worst value seen on that side. */
export function checkExcursions(check: CheckValuesC, limits: CelsiusLimits): { kind: 'high' | 'low'; peakC: number }[] {
  const values = [check.currentC, check.minC, check.maxC].filter((v): v is number => v !== null);
  const high = values.filter((v) => classifyTemperatureC(v, limits) === 'high');
  const low = values.filter((v) => classifyTemperatureC(v, limits) === 'low');
  return [
    ...(high.length ? [{ kind: 'high' as const, peakC: Math.max(...high) }] : []),
    ...(low.length ? [{ kind: 'low' as const, peakC: Math.min(...low) }] : []),
  ];
}
