// Doses a vaccination needs: one per bird plus the site's overage, in integer arithmetic so 20,000 birds at 5 % is exactly 21,000.
const BASIS_POINTS_PER_WHOLE = 10_000;

/** 5 → 500, 2.5 → 250; more than two decimals is refused rather than silently rounded. */
export function overagePercentToBasisPoints(percent: number): number {
  if (!Number.isFinite(percent) || percent < 0) throw new RangeError(`overage percent must be a non-negative number, got ${percent}`);
  const basisPoints = Math.round(percent * 100);
  // percent * 100 carries binary noise (1.15 * 100 = 114.99999999999999), so "close to a whole basis point" is the test.
  if (Math.abs(percent * 100 - basisPoints) > 1e-6) throw new RangeError(`overage percent allows at most two decimals, got ${percent}`);
  return basisPoints;
}

/** birds × (1 + overage), rounded up to a whole dose. */
export function dosesNeeded(birds: number, overageBasisPoints = 0): number {
  if (!Number.isSafeInteger(birds) || birds < 0) throw new RangeError(`birds must be a non-negative whole number, got ${birds}`);
  if (!Number.isSafeInteger(overageBasisPoints) || overageBasisPoints < 0) {
    throw new RangeError(`overage basis points must be a non-negative whole number, got ${overageBasisPoints}`);
  }
  const scaled = birds * (BASIS_POINTS_PER_WHOLE + overageBasisPoints);
  if (!Number.isSafeInteger(scaled)) throw new RangeError(`birds × overage is too large to compute exactly: ${birds}`);
  const remainder = scaled % BASIS_POINTS_PER_WHOLE;
  return (scaled - remainder) / BASIS_POINTS_PER_WHOLE + (remainder > 0 ? 1 : 0);
}
