// The logger files of the bad-input corpus too big to commit, built the same way on every run.

const T0 = Date.UTC(2026, 2, 1, 8, 0);
const stamp = (minutes: number) => new Date(T0 + minutes * 60_000).toISOString().replace('.000', '');
const HEADER = 'Time,Temperature (°C)';

function rows(count: number, from = 0): string[] {
  return Array.from({ length: count }, (_, i) => `${stamp((from + i) * 10)},${(4 + (i % 5) * 0.25).toFixed(2)}`);
}

export const badLogGenerators: Record<string, () => Buffer> = {
  /** 10 MB of digits and commas without a single line end. */
  'ten-mb-single-line': () => Buffer.alloc(10 * 1024 * 1024, '4.0,'),
  /** A header and rows of 100,000 columns each (the temperature is the second). */
  'hundred-thousand-columns': () => {
    const filler = ',0'.repeat(99_998);
    const header = `Time,Temperature (°C)${Array.from({ length: 99_998 }, (_, i) => `,c${i + 3}`).join('')}`;
    return Buffer.from([header, ...rows(3).map((row) => row + filler)].join('\n') + '\n');
  },
  /** Lines 2–4 and 6–8 are readings; line 5 is a 10 MB row. */
  'ten-mb-row-inside': () => Buffer.from([HEADER, ...rows(3), `${stamp(35)},4.0,${'x'.repeat(10 * 1024 * 1024)}`, ...rows(3, 3)].join('\n') + '\n'),
  /** 150 readings (lines 2–151), 300,000 unreadable rows (lines 152–300,151), two readings. */
  'three-hundred-thousand-bad-lines': () => {
    const bad = Array.from({ length: 300_000 }, (_, i) => `${stamp(1_500 + i)},sensor fault`);
    return Buffer.from([HEADER, ...rows(150), ...bad, ...rows(2, 40_000)].join('\n') + '\n');
  },
  /** 200,000 good ten-minute readings (about 6 MB). */
  'two-hundred-thousand-readings': () => Buffer.from([HEADER, ...rows(200_000)].join('\n') + '\n'),
};
