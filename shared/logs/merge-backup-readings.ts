// A fridge's series: its primary logger's readings, with the backup's filling the primary's gaps (marked as such).
import type { LogGap } from './log-gap.js';
import { readingDurations, type TimedReading } from './reading-durations.js';

export interface SeriesReading extends TimedReading {
  /** Set on every reading, so analysis keeps what each logger's own interval says. */
  readonly standsForMs: number;
  readonly fromBackup: boolean;
}

/** A reading of the merged series: a backup's carries the time it stands for; a lone primary needs none. */
export type MergedReading = TimedReading & { readonly fromBackup?: boolean };

export interface MergedSeries {
  readonly readings: readonly MergedReading[];
  /** Stretches of the primary's gaps that backup readings stand for. */
  readonly fills: LogGap[];
}

interface Span {
  start: number;
  end: number;
}

/** Each reading with the time it stands for in its own logger's series; a lone reading borrows `fallbackMs`. */
function withDurations(readings: readonly TimedReading[], fallbackMs: number): { at: number; tempC: number; ms: number }[] {
  if (readings.length === 1) return [{ at: readings[0].at, tempC: readings[0].tempC, ms: fallbackMs }];
  const { durationsMs } = readingDurations(readings);
  return readings.map((r, i) => ({ at: r.at, tempC: r.tempC, ms: durationsMs[i] }));
}

/** Where the primary says nothing: before its first reading, in its gaps, and after its last reading's time. */
function uncovered(primary: { at: number; ms: number }[]): Span[] {
  if (primary.length === 0) return [{ start: -Infinity, end: Infinity }];
  const spans: Span[] = [{ start: -Infinity, end: primary[0].at }];
  for (let i = 0; i < primary.length; i++) {
    const end = primary[i].at + primary[i].ms;
    const next = i + 1 < primary.length ? primary[i + 1].at : Infinity;
    if (end < next) spans.push({ start: end, end: next });
  }
  return spans;
}

/**
 * Both inputs sorted by time, one logger's readings each (several primaries over time count as one series).
 * A backup reading is used only inside a stretch the primary does not cover, and stands for no longer
 * than its own logger's interval nor past the primary's next reading. Where no backup reading falls, the
 * gap stays a gap: nothing is invented.
 */
export function mergeBackupReadings(primary: readonly TimedReading[], backup: readonly TimedReading[]): MergedSeries {
  // Nothing to fill with: the primary's readings as they are (a year of them is worth not copying).
  if (!backup.length) return { readings: primary, fills: [] };
  const primaryTimed = primary.length ? withDurations(primary, backup.length > 1 ? readingDurations(backup).intervalMs : 0) : [];
  const backupTimed = backup.length ? withDurations(backup, primary.length > 1 ? readingDurations(primary).intervalMs : 0) : [];
  const readings: SeriesReading[] = primaryTimed.map((r) => ({ at: r.at, tempC: r.tempC, standsForMs: r.ms, fromBackup: false }));
  const fills: LogGap[] = [];
  let k = 0;
  for (const span of uncovered(primaryTimed)) {
    while (k < backupTimed.length && backupTimed[k].at < span.start) k++;
    for (; k < backupTimed.length && backupTimed[k].at < span.end; k++) {
      const b = backupTimed[k];
      const ms = Math.min(b.ms, span.end - b.at);
      if (!(ms > 0)) continue;
      readings.push({ at: b.at, tempC: b.tempC, standsForMs: ms, fromBackup: true });
      const last = fills[fills.length - 1];
      if (last && last.end === b.at) fills[fills.length - 1] = { start: last.start, end: b.at + ms, minutes: (b.at + ms - last.start) / 60_000 };
      else fills.push({ start: b.at, end: b.at + ms, minutes: ms / 60_000 });
    }
  }
  readings.sort((a, b) => a.at - b.at);
  return { readings, fills };
}
