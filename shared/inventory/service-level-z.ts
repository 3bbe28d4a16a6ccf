// The standard normal z for a service level (probability of not stocking out during lead time).
import jstat from 'jstat';

/** 0.95 → 1.6449. */
export function zForServiceLevel(serviceLevel: number): number {
  if (!(serviceLevel > 0 && serviceLevel < 1)) throw new RangeError(`service level must be strictly between 0 and 1, got ${serviceLevel}`);
  return jstat.jStat.normal.inv(serviceLevel, 0, 1);
}
