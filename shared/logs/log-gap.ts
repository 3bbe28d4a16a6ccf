// A stretch of time no reading stands for: the logger was off, or rows are missing.

export interface LogGap {
  /** Epoch ms: the previous reading's time plus the nominal interval. */
  readonly start: number;
  /** Epoch ms: the next reading's time. */
  readonly end: number;
  readonly minutes: number;
}
