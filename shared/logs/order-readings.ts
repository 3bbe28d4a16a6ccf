// Puts readings in time order and keeps only the first row (in file order) for each instant.
import type { LogReading } from './log-reading.js';
import type { LogWarning } from './log-warning.js';

export interface OrderedReadings {
  readonly readings: LogReading[];
  readonly dropped: number;
  /** The first `keptWarnings` warnings by line. */
  readonly warnings: LogWarning[];
  readonly warningCount: number;
}

/** Line of the first reading earlier than one before it, 0 when all are in order. */
function firstOutOfOrder(readings: readonly LogReading[]): number {
  let latest = -Infinity;
  for (const r of readings) {
    if (r.at < latest) return r.line;
    latest = Math.max(latest, r.at);
  }
  return 0;
}

/**
 * `readings` in file order. A reader that tracked `outOfOrderLine` while reading passes it in
 * (0 when in order), so an ordered file is neither scanned again nor sorted.
 */
export function orderReadings(
  readings: readonly LogReading[],
  outOfOrderLine = firstOutOfOrder(readings),
  keptWarnings = Infinity,
): OrderedReadings {
  const warnings: LogWarning[] = [];
  let warningCount = 0;
  let sorted = readings;
  if (outOfOrderLine > 0) {
    // Ties broken by line so the first row in the file is the one kept below.
    sorted = [...readings].sort((a, b) => a.at - b.at || a.line - b.line);
    warningCount++;
    warnings.push({
      line: outOfOrderLine,
      message: `rows are not in time order (first at line ${outOfOrderLine}); they were sorted by time`,
    });
  }
  const kept: LogReading[] = [];
  let dropped = 0;
  for (const reading of sorted) {
    const previous = kept[kept.length - 1];
    if (previous !== undefined && previous.at === reading.at) {
      dropped++;
      warningCount++;
      if (warnings.length < keptWarnings) {
        const at = new Date(reading.at).toISOString();
        warnings.push({ line: reading.line, message: `repeats time ${at} of line ${previous.line}; row skipped` });
      }
    } else kept.push(reading);
  }
  // Past the cap repeats are only counted (they are met in time order, which is line order unless the file was sorted).
  return { readings: kept, dropped, warnings, warningCount };
}
