// Analyses a series of readings against a range: coverage, gaps, excursions, mean and MKT.
import { classifyTemperatureC } from '../temperature/classify-temperature.js';
import type { CelsiusLimits } from '../temperature/temperature-range.js';
import type { AnalysisResult } from './analysis-result.js';
import { findExcursions } from './find-excursions.js';
import { meanKineticTemperatureC } from './mean-kinetic-temperature.js';
import { readingDurations, type TimedReading } from './reading-durations.js';
import { weightedMean } from './weighted-mean.js';

/** Works on readings from a file or a database alike; they are sorted by time here if they are not already. */
export function analyzeReadings(readings: readonly TimedReading[], limits: CelsiusLimits): AnalysisResult {
  if (readings.length < 2) throw new RangeError('analysis needs at least two readings');
  const sorted = readings.every((r, i) => i === 0 || readings[i - 1].at <= r.at)
    ? readings
    : [...readings].sort((a, b) => a.at - b.at);
  const durations = readingDurations(sorted);
  if (!(durations.intervalMs > 0)) throw new RangeError('analysis needs readings at two or more distinct times');
  const temps = new Float64Array(sorted.length);
  const msBySide = { in: 0, high: 0, low: 0 };
  let minC = Infinity;
  let maxC = -Infinity;
  for (let i = 0; i < sorted.length; i++) {
    const t = sorted[i].tempC;
    temps[i] = t;
    minC = Math.min(minC, t);
    maxC = Math.max(maxC, t);
    msBySide[classifyTemperatureC(t, limits)] += durations.durationsMs[i];
  }
  return {
    readings: sorted.length,
    first: sorted[0].at,
    last: sorted[sorted.length - 1].at,
    intervalMinutes: durations.intervalMs / 60_000,
    lowC: limits.lowC,
    highC: limits.highC,
    minC,
    maxC,
    meanC: weightedMean(temps, durations.durationsMs),
    mktC: meanKineticTemperatureC(temps, durations.durationsMs),
    minutesInRange: msBySide.in / 60_000,
    minutesAbove: msBySide.high / 60_000,
    minutesBelow: msBySide.low / 60_000,
    gapMinutes: durations.gaps.reduce((sum, g) => sum + g.minutes, 0),
    excursions: findExcursions(sorted, durations, limits),
    gaps: durations.gaps,
  };
}
