// A stock count's lines: counted against expected, the difference, and the adjustment each difference posts.
export interface CountLineInput {
  lotId: number;
  /** The vials the sheet showed when the counter opened it. */
  expected: number;
  counted: number;
  reason: string;
}

export interface CountLineProblem {
  index: number;
  field: 'reason' | 'lotId';
  message: string;
}

export interface CountAdjustment {
  lotId: number;
  /** 'in' adds vials to the fridge (more found than expected), 'out' takes them away. */
  direction: 'in' | 'out';
  vials: number;
  reason: string;
}

export const difference = (line: Pick<CountLineInput, 'expected' | 'counted'>): number => line.counted - line.expected;

/** Lines that cannot be saved: a difference without a reason, a lot named twice. */
export function countLineProblems(lines: readonly CountLineInput[]): CountLineProblem[] {
  const problems: CountLineProblem[] = [];
  const seen = new Set<number>();
  lines.forEach((line, index) => {
    if (seen.has(line.lotId)) problems.push({ index, field: 'lotId', message: 'This lot is on the sheet twice.' });
    seen.add(line.lotId);
    if (difference(line) !== 0 && !line.reason.trim()) problems.push({ index, field: 'reason', message: 'Say why the count differs.' });
  });
  return problems;
}

/** In lot order, so two transactions adjusting the same balances lock them in the same order. */
export function countAdjustments(lines: readonly CountLineInput[]): CountAdjustment[] {
  return [...lines]
    .sort((a, b) => a.lotId - b.lotId)
    .filter((line) => difference(line) !== 0)
    .map((line) => ({ lotId: line.lotId, direction: difference(line) > 0 ? 'in' : 'out', vials: Math.abs(difference(line)), reason: line.reason.trim() }));
}
