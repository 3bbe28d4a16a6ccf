// The total length of a set of possibly overlapping intervals (vials of one lot may sit in two fridges at once).
export interface Interval {
  start: number;
  end: number;
}

export function unionLengthMs(intervals: readonly Interval[]): number {
  const sorted = [...intervals].filter((i) => i.end > i.start).sort((a, b) => a.start - b.start);
  let total = 0;
  let currentStart = -Infinity;
  let currentEnd = -Infinity;
  for (const { start, end } of sorted) {
    if (start > currentEnd) {
      if (currentEnd > currentStart) total += currentEnd - currentStart;
      currentStart = start;
      currentEnd = end;
    } else {
      currentEnd = Math.max(currentEnd, end);
    }
  }
  if (currentEnd > currentStart) total += currentEnd - currentStart;
  return total;
}
