// The logger's nominal interval: the median step between consecutive readings, robust to gaps and hiccups.

/** Readings sorted by time; zero steps (repeated instants) are left out. NaN with fewer than two instants. */
export function nominalIntervalMs(readings: readonly { readonly at: number }[]): number {
  const steps = new Float64Array(Math.max(readings.length - 1, 0));
  let n = 0;
  for (let i = 1; i < readings.length; i++) {
    const step = readings[i].at - readings[i - 1].at;
    if (step > 0) steps[n++] = step;
  }
  if (n === 0) return NaN;
  const sorted = steps.subarray(0, n).sort();
  const mid = n >> 1;
  return n % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}
