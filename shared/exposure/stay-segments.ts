// Cuts a fridge's readings down to one stay: the stretches of known temperature the vials lived through, and the unknown rest.
import { readingDurations } from '../logs/reading-durations.js';
import type { FridgeReading, Segment, UnknownStretch } from './exposure-types.js';

export interface StaySegments {
  segments: Segment[];
  unknown: UnknownStretch[];
}

function unknownStretch(fridgeId: number, start: number, end: number, reason: UnknownStretch['reason']): UnknownStretch {
  return { fridgeId, start, end, minutes: (end - start) / 60_000, reason };
}

/**
 * Each reading stands for the time until the next (the log analysis's rule, gaps included), or for its own
 * `standsForMs` where the merge of primary and backup set it; the parts of [from, to) no reading stands for are
 * unknown, never assumed fine.
 */
export function staySegments(fridgeId: number, readings: readonly FridgeReading[], from: number, to: number): StaySegments {
  const segments: Segment[] = [];
  const unknown: UnknownStretch[] = [];
  if (to <= from) return { segments, unknown };
  if (readings.length === 0) return { segments, unknown: [unknownStretch(fridgeId, from, to, 'no-readings')] };
  const durations = readingDurations(readings);
  let cursor = from;
  for (let i = 0; i < readings.length; i++) {
    const start = readings[i].at;
    const end = start + durations.durationsMs[i];
    if (end <= from) continue;
    if (start >= to) break;
    const clippedStart = Math.max(start, from);
    const clippedEnd = Math.min(end, to);
    if (clippedStart > cursor) {
      // A hole after some earlier reading is a gap in the log; before the fridge's first reading there is no log yet.
      unknown.push(unknownStretch(fridgeId, cursor, clippedStart, i > 0 ? 'gap' : 'no-readings'));
    }
    segments.push({ fridgeId, start: clippedStart, end: clippedEnd, tempC: readings[i].tempC });
    cursor = clippedEnd;
  }
  if (cursor < to) unknown.push(unknownStretch(fridgeId, cursor, to, 'no-readings'));
  return { segments, unknown };
}
