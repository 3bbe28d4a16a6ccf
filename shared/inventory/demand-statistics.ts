// Mean and sample standard deviation of a per-period demand history.
export interface DemandStatistics {
  readonly periods: number;
  readonly mean: number;
  /** n − 1 in the denominator: the history is a sample of future demand, not all of it. */
  readonly sampleSd: number;
}

export function demandStatistics(history: readonly number[]): DemandStatistics {
  if (history.length < 2) throw new RangeError(`a demand history needs at least 2 periods, got ${history.length}`);
  for (const value of history) {
    if (!Number.isFinite(value) || value < 0) throw new RangeError(`demand per period must be a number ≥ 0, got ${value}`);
  }
  const mean = history.reduce((sum, value) => sum + value, 0) / history.length;
  const squares = history.reduce((sum, value) => sum + (value - mean) ** 2, 0);
  return { periods: history.length, mean, sampleSd: Math.sqrt(squares / (history.length - 1)) };
}
