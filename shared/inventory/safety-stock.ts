// Safety stock in doses, stated either directly or as days of cover at the average daily demand.
export type SafetyStock =
  | { readonly kind: 'doses'; readonly doses: number }
  | { readonly kind: 'daysOfCover'; readonly days: number; readonly averageDailyDoses: number };

/** Whole doses, rounded up: a fractional dose of cover still needs a dose on the shelf. */
export function safetyStockDoses(stock: SafetyStock): number {
  if (stock.kind === 'doses') {
    requireNonNegative(stock.doses, 'safety stock doses');
    return ceilIgnoringNoise(stock.doses);
  }
  requireNonNegative(stock.days, 'days of cover');
  requireNonNegative(stock.averageDailyDoses, 'average daily doses');
  return ceilIgnoringNoise(stock.days * stock.averageDailyDoses);
}

// 100 × 1.1 is 110.00000000000001 in binary; rounding that noise up would order a dose nobody asked for.
function ceilIgnoringNoise(value: number): number {
  return Math.ceil(value - 1e-9 * Math.max(1, Math.abs(value)));
}

function requireNonNegative(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a number ≥ 0, got ${value}`);
}
