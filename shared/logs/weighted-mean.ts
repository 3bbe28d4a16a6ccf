// The time-weighted mean: each value counts for as long as it stands for.

/** Without weights, the plain mean. NaN when there is nothing to average. */
export function weightedMean(values: ArrayLike<number>, weights?: ArrayLike<number>): number {
  if (weights !== undefined && weights.length !== values.length) {
    throw new RangeError('values and weights differ in length');
  }
  let sum = 0;
  let total = 0;
  for (let i = 0; i < values.length; i++) {
    const w = weights === undefined ? 1 : weights[i];
    sum += w * values[i];
    total += w;
  }
  return total > 0 ? sum / total : NaN;
}
