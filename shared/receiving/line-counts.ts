// One shipment line's vial counts and what differs from what was expected.
export interface LineCounts {
  vialsExpected: number;
  vialsIntact: number;
  vialsBroken: number;
  vialsMissing: number;
}

export interface LineDifference {
  broken: number;
  missing: number;
  /** Counted (intact + broken + missing) minus expected: non-zero means the counts do not add up. */
  unaccounted: number;
  /** Intact vials short of what was expected (never negative). */
  short: number;
}

export function lineDifference(line: LineCounts): LineDifference {
  const counted = line.vialsIntact + line.vialsBroken + line.vialsMissing;
  return {
    broken: line.vialsBroken,
    missing: line.vialsMissing,
    unaccounted: counted - line.vialsExpected,
    short: Math.max(0, line.vialsExpected - line.vialsIntact),
  };
}
