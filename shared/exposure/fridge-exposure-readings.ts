// A fridge's readings as exposure takes them: the primary's, with the backup's filling its gaps, each keeping its own duration.
import { mergeBackupReadings } from '../logs/merge-backup-readings.js';
import type { TimedReading } from '../logs/reading-durations.js';
import type { FridgeReading } from './exposure-types.js';

/**
 * The same merged series the fridge chart and the excursions use. Each reading keeps the time the merge says it
 * stands for: a backup reading every 30 minutes inside a primary's 10-minute series would otherwise be cut to the
 * merged series' 10-minute step, leaving unknown slivers in a gap the backup covers.
 */
export function fridgeExposureReadings(primary: readonly TimedReading[], backup: readonly TimedReading[]): FridgeReading[] {
  return mergeBackupReadings(primary, backup).readings.map((r) =>
    r.standsForMs === undefined ? { at: r.at, tempC: r.tempC } : { at: r.at, tempC: r.tempC, standsForMs: r.standsForMs },
  );
}
