// The mixing sheet's arithmetic: water for the mix from the label's rate, and when the mixed vaccine must be used by.
export interface MixInput {
  birds: number;
  /** mL of water per 1,000 birds, from the label or the veterinarian; null when nobody has entered it. */
  mlPer1000Birds: number | null;
}

/** Whole millilitres, rounded up; null when the rate is unknown (Vialyard never invents it). */
export function waterVolumeMl({ birds, mlPer1000Birds }: MixInput): number | null {
  if (mlPer1000Birds === null || !(mlPer1000Birds > 0) || !(birds > 0)) return null;
  // Integer arithmetic where possible: 20,000 birds at 250 mL per 1,000 is exactly 5,000 mL.
  return Math.ceil((birds * Math.round(mlPer1000Birds * 1000)) / 1_000_000);
}

/** The moment the mix must be used by, or null when the label's use-within time is not known. */
export function useByInstant(mixedAt: number, useWithinMinutes: number | null): number | null {
  return useWithinMinutes === null || !(useWithinMinutes > 0) ? null : mixedAt + useWithinMinutes * 60_000;
}

/** Milliseconds left before the use-by moment (negative once past), for the countdown. */
export function msLeft(useBy: number, now: number): number {
  return useBy - now;
}
