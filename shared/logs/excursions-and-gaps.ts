// Just the excursions and gaps of a series, for recomputing stored records without the summary figures.
import type { CelsiusLimits } from '../temperature/temperature-range.js';
import type { Excursion } from './excursion.js';
import { findExcursions } from './find-excursions.js';
import type { LogGap } from './log-gap.js';
import { readingDurations, type TimedReading } from './reading-durations.js';

/** Readings sorted by time; fewer than two distinct instants have neither. Same rules as analyzeReadings. */
export function excursionsAndGaps(readings: readonly TimedReading[], limits: CelsiusLimits): { excursions: Excursion[]; gaps: LogGap[] } {
  if (readings.length < 2) return { excursions: [], gaps: [] };
  const durations = readingDurations(readings);
  if (!(durations.intervalMs > 0)) return { excursions: [], gaps: [] };
  return { excursions: findExcursions(readings, durations, limits), gaps: durations.gaps };
}
