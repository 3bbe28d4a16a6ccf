// Which lots a fridge's readings put outside their own product's range (or at freezing), and when: the pure part of
// the automatic excursion and freeze holds.
import { meanKineticTemperatureC } from '../logs/mean-kinetic-temperature.js';
import { checkExcursions, type CheckValuesC } from '../fridges/check-out-of-range.js';
import { excursionsAndGaps } from '../logs/excursions-and-gaps.js';
import type { Excursion } from '../logs/excursion.js';
import { readingDurations, type TimedReading } from '../logs/reading-durations.js';
import { LIMIT_TOLERANCE_C } from '../temperature/classify-temperature.js';
import type { CelsiusLimits } from '../temperature/temperature-range.js';
import type { Stay } from './exposure-types.js';

export type ExposureCause = 'excursion' | 'freeze';

/** A lot as the holds judge it: its own product's range, whether freezing harms it, and its stays per fridge. */
export interface JudgedLot {
  lotId: number;
  limits: CelsiusLimits;
  freezeSensitive: boolean;
  stays: readonly Stay[];
}

/** Lots judged by one rule: one product range (cause excursion), or "at or below 0 °C" (cause freeze). */
export interface JudgedGroup {
  cause: ExposureCause;
  limits: CelsiusLimits;
  lots: JudgedLot[];
}

/**
 * "At or below 0 °C": classifyTemperatureC calls a reading low below lowC − tolerance, so this lowC makes 0.0 °C low
 * and anything above it (0.001 °C and up) in range. Freezing has no upper side.
 */
export const freezeLimits: CelsiusLimits = { lowC: LIMIT_TOLERANCE_C + 1e-9, highC: Number.POSITIVE_INFINITY };

const sameLimits = (a: CelsiusLimits, b: CelsiusLimits) => Math.abs(a.lowC - b.lowC) < 1e-6 && Math.abs(a.highC - b.highC) < 1e-6;

/** One group per distinct product range, plus one freeze group of the freeze-sensitive lots. */
export function judgedGroups(lots: readonly JudgedLot[]): JudgedGroup[] {
  const groups: JudgedGroup[] = [];
  for (const lot of lots) {
    const group = groups.find((g) => g.cause === 'excursion' && sameLimits(g.limits, lot.limits));
    if (group) group.lots.push(lot);
    else groups.push({ cause: 'excursion', limits: lot.limits, lots: [lot] });
  }
  const freezing = lots.filter((lot) => lot.freezeSensitive);
  if (freezing.length) groups.push({ cause: 'freeze', limits: freezeLimits, lots: freezing });
  return groups;
}

const overlaps = (stay: Stay, start: number, end: number) => stay.from < end && (stay.to ?? Number.POSITIVE_INFINITY) > start;

/** The lots that had vials in the fridge at some time in [start, end); at one instant when start equals end. */
export function lotsPresent(lots: readonly JudgedLot[], fridgeId: number, start: number, end: number): number[] {
  const present = (stay: Stay) =>
    stay.fridgeId === fridgeId && (start === end ? stay.from <= start && (stay.to ?? Number.POSITIVE_INFINITY) > start : overlaps(stay, start, end));
  return lots.filter((lot) => lot.stays.some(present)).map((lot) => lot.lotId);
}

/** The runs of the fridge's readings outside the group's range that meet the window and found a lot of the group there. */
export function groupRuns(readings: readonly TimedReading[], group: JudgedGroup, fridgeId: number, window: { start: number; end: number }): Excursion[] {
  const kinds = group.cause === 'freeze' ? ['low'] : ['high', 'low'];
  return excursionsAndGaps(readings, group.limits).excursions.filter(
    (run) => kinds.includes(run.kind) && run.start <= window.end && run.end >= window.start && lotsPresent(group.lots, fridgeId, run.start, run.end).length > 0,
  );
}

/** A daily check's values outside the group's range (freezing: a value at or below 0 °C). */
export function groupCheckCrossings(values: CheckValuesC, group: JudgedGroup): { kind: 'high' | 'low'; peakC: number }[] {
  return checkExcursions(values, group.limits).filter((c) => group.cause === 'excursion' || c.kind === 'low');
}

/** Mean kinetic temperature of the 24 hours ending at `end`, each reading weighted by the time it stands for (USP PF 44(4)). */
export function mkt24hEndingAt(readings: readonly TimedReading[], end: number): number | null {
  const from = end - 24 * 3_600_000;
  const durations = readingDurations(readings).durationsMs;
  const temps: number[] = [];
  const weights: number[] = [];
  for (let i = 0; i < readings.length; i++) {
    const w = Math.min(readings[i].at + durations[i], end) - Math.max(readings[i].at, from);
    if (w > 0) {
      temps.push(readings[i].tempC);
      weights.push(w);
    }
  }
  const mkt = meanKineticTemperatureC(temps, weights);
  return Number.isFinite(mkt) ? mkt : null;
}
