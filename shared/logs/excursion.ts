// A run of readings outside the allowed range.

export interface Excursion {
  readonly kind: 'high' | 'low';
  /** Epoch ms of the first reading. */
  readonly start: number;
  /** Epoch ms: the last reading's time plus the time it stands for. */
  readonly end: number;
  readonly minutes: number;
  /** Highest temperature of a high excursion, lowest of a low one. */
  readonly peakC: number;
  /** Σ |t − limit| × minutes: how far outside, for how long. */
  readonly degreeMinutesC: number;
  /** The data ends while still outside the range, so the next file may continue it. */
  readonly openEnded: boolean;
}
