// How long each reading stands for, and the gaps left where readings are missing.
import type { LogGap } from './log-gap.js';
import { nominalIntervalMs } from './nominal-interval.js';

/** A reading as analysis takes it; `standsForMs` lets a caller that already knows it (e.g. a clipped window) say so. */
export interface TimedReading {
  readonly at: number;
  readonly tempC: number;
  readonly standsForMs?: number;
}

export interface ReadingDurations {
  readonly intervalMs: number;
  /** Parallel to the readings. */
  readonly durationsMs: Float64Array;
  /** Parallel to the readings: whether a gap follows the reading. */
  readonly gapAfter: Uint8Array;
  readonly gaps: LogGap[];
}

/**
 * Each reading stands for the time until the next, but never more than one nominal interval once
 * that time exceeds two intervals; the rest is a gap. The last reading stands for one interval.
 */
export function readingDurations(readings: readonly TimedReading[]): ReadingDurations {
  const intervalMs = nominalIntervalMs(readings);
  const n = readings.length;
  const durationsMs = new Float64Array(n);
  const gapAfter = new Uint8Array(n);
  const gaps: LogGap[] = [];
  for (let i = 0; i < n; i++) {
    const r = readings[i];
    const next = i + 1 < n ? readings[i + 1].at : undefined;
    const step = next === undefined ? intervalMs : next - r.at;
    const standsFor = r.standsForMs ?? (step > 2 * intervalMs ? intervalMs : step);
    durationsMs[i] = standsFor;
    if (next !== undefined && r.at + standsFor < next) {
      gapAfter[i] = 1;
      gaps.push({ start: r.at + standsFor, end: next, minutes: (next - r.at - standsFor) / 60_000 });
    }
  }
  return { intervalMs, durationsMs, gapAfter, gaps };
}
