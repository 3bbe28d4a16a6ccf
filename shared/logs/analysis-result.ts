// What the analysis of a series of readings reports.
import type { Excursion } from './excursion.js';
import type { LogGap } from './log-gap.js';

export interface AnalysisResult {
  readonly readings: number;
  /** Epoch ms of the first and last reading. */
  readonly first: number;
  readonly last: number;
  readonly intervalMinutes: number;
  readonly lowC: number;
  readonly highC: number;
  readonly minC: number;
  readonly maxC: number;
  /** Time-weighted. */
  readonly meanC: number;
  readonly mktC: number;
  readonly minutesInRange: number;
  readonly minutesAbove: number;
  readonly minutesBelow: number;
  readonly gapMinutes: number;
  readonly excursions: readonly Excursion[];
  readonly gaps: readonly LogGap[];
}
