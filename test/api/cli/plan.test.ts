import { expect } from 'chai';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PassThrough } from 'node:stream';
import { command } from '../../../api/cli/commands/plan.js';

interface RunResult {
  code: number;
  stdout: string;
  stderr: string;
}

async function run(args: string[], stdinText = ''): Promise<RunResult> {
  const [stdout, stderr, stdin] = [new PassThrough(), new PassThrough(), new PassThrough()];
  const collected = { stdout: '', stderr: '' };
  stdout.on('data', (chunk: Buffer) => (collected.stdout += chunk.toString()));
  stderr.on('data', (chunk: Buffer) => (collected.stderr += chunk.toString()));
  stdin.end(stdinText);
  const code = await command.run(args, { stdout, stderr, stdin });
  return { code, ...collected };
}

const farmFile = {
  overagePercent: 5,
  lots: [
    { id: 'A-0425', product: 'Product A', dosesPerVial: 1000, vials: 30, expiry: '2026-04', status: 'usable' },
    { id: 17, product: 'Product A', dosesPerVial: 5000, vials: 6, expiry: '2026-09-30', status: 'usable' },
    { id: 'A-hold', product: 'Product A', dosesPerVial: 20_000, vials: 5, expiry: '2026-12-31', status: 'hold' },
    { id: 'B-1', product: 'Product B', dosesPerVial: 2000, vials: 10, expiry: '2026-05-31', status: 'usable' },
    { id: 'B-old', product: 'Product B', dosesPerVial: 2000, vials: 4, expiry: '2026-03-31', status: 'discarded' },
  ],
  vaccinations: [
    { id: 'house-2-d14', product: 'Product A', date: '2026-05-02', birds: 20_000 },
    { id: 'house-1-d1', product: 'Product A', date: '2026-04-20', birds: 20_000 },
    { id: 3, product: 'Product B', date: '2026-04-20', birds: 12_000 },
    { id: 'house-1-d21', product: 'Product B', date: '2026-06-10', birds: 5000 },
  ],
};

describe('plan command', () => {
  let dir: string;
  const file = async (name: string, content: string): Promise<string> => {
    const path = join(dir, name);
    await writeFile(path, content);
    return path;
  };

  before(async () => {
    dir = await mkdtemp(join(tmpdir(), 'vialyard-plan-'));
  });
  after(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('plans a small farm file field by field and exits 0', async () => {
    const result = await run([await file('farm.json', JSON.stringify(farmFile))]);
    expect(result.code, result.stderr).to.equal(0);
    expect(result.stderr).to.equal('');
    const plan = JSON.parse(result.stdout);
    // Planning order: date, then id (numbers before strings).
    expect(plan.vaccinations.map((v: { id: unknown }) => v.id)).to.deep.equal([3, 'house-1-d1', 'house-2-d14', 'house-1-d21']);
    // 12,000 birds at 5 % = 12,600 doses; 2,000-dose vials → 7 vials, 1,400 opened beyond the need.
    expect(plan.vaccinations[0]).to.deep.equal({
      id: 3,
      dosesNeeded: 12_600,
      allocations: [{ lot: 'B-1', vials: 7, doses: 14_000 }],
      dosesAllocated: 14_000,
      dosesWasted: 1400,
      shortfallDoses: 0,
    });
    // April stock (month end 2026-04-30) goes first: 21 × 1,000 = 21,000 exactly.
    expect(plan.vaccinations[1]).to.deep.equal({
      id: 'house-1-d1',
      dosesNeeded: 21_000,
      allocations: [{ lot: 'A-0425', vials: 21, doses: 21_000 }],
      dosesAllocated: 21_000,
      dosesWasted: 0,
      shortfallDoses: 0,
    });
    // In May the April lot has expired and the held lot is not counted: 5 × 5,000 = 25,000 for 21,000.
    expect(plan.vaccinations[2]).to.deep.equal({
      id: 'house-2-d14',
      dosesNeeded: 21_000,
      allocations: [{ lot: 17, vials: 5, doses: 25_000 }],
      dosesAllocated: 25_000,
      dosesWasted: 4000,
      shortfallDoses: 0,
    });
    // June: B-1 expired on 2026-05-31, B-old is discarded, so all 5,250 doses are short.
    expect(plan.vaccinations[3]).to.deep.equal({
      id: 'house-1-d21',
      dosesNeeded: 5250,
      allocations: [],
      dosesAllocated: 0,
      dosesWasted: 0,
      shortfallDoses: 5250,
    });
    expect(plan.lotsLeft).to.deep.equal([
      { id: 'A-0425', vials: 9 },
      { id: 17, vials: 1 },
      { id: 'A-hold', vials: 5 },
      { id: 'B-1', vials: 3 },
      { id: 'B-old', vials: 4 },
    ]);
    expect(plan.expiringUnused).to.deep.equal([
      { lot: 'A-0425', vials: 9, doses: 9000, expiry: '2026-04-30' },
      { lot: 'B-1', vials: 3, doses: 6000, expiry: '2026-05-31' },
    ]);
  });

  it('reads the file from standard input when given "-"', async () => {
    const result = await run(['-'], JSON.stringify(farmFile));
    expect(result.code).to.equal(0);
    expect(JSON.parse(result.stdout).vaccinations).to.have.length(4);
  });

  it('exits 2 with usage when no file is given', async () => {
    const result = await run([]);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/^usage: /);
    expect(result.stdout).to.equal('');
  });

  it('exits 2 naming a file that does not exist', async () => {
    const missing = join(dir, 'missing.json');
    const result = await run([missing]);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.contain(`${missing}: cannot read file`);
  });

  it('exits 2 when the file is not JSON', async () => {
    const result = await run([await file('broken.json', '{"lots": [')]);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/broken\.json: not valid JSON/);
  });

  it('exits 1 explaining the limit when near-coprime vial sizes would need too large a table', async () => {
    const huge = {
      lots: [
        { id: 'X1', product: 'Product A', dosesPerVial: 1_000_000, vials: 100, expiry: '2026-12-31', status: 'usable' },
        { id: 'X2', product: 'Product A', dosesPerVial: 999_999, vials: 100, expiry: '2026-12-31', status: 'usable' },
      ],
      vaccinations: [{ id: 'v1', product: 'Product A', date: '2026-05-01', birds: 10_000_000 }],
    };
    const result = await run([await file('huge.json', JSON.stringify(huge))]);
    expect(result.code).to.equal(1);
    expect(result.stderr).to.match(/huge\.json: cannot plan: .*common unit \(1 doses\)/);
    expect(result.stdout).to.equal('');
  });

  const malformed: [string, (input: typeof farmFile) => unknown, RegExp][] = [
    ['a missing field', (input) => ({ ...input, lots: input.lots.map((lot, i) => (i === 1 ? { ...lot, status: undefined } : lot)) }), /: lots\[1\]\.status: /],
    ['a wrong type', (input) => ({ ...input, vaccinations: input.vaccinations.map((v, i) => (i === 2 ? { ...v, birds: '12000' } : v)) }), /: vaccinations\[2\]\.birds: /],
    ['a negative number', (input) => ({ ...input, lots: input.lots.map((lot, i) => (i === 3 ? { ...lot, vials: -4 } : lot)) }), /: lots\[3\]\.vials: /],
    ['a bad date', (input) => ({ ...input, lots: input.lots.map((lot, i) => (i === 2 ? { ...lot, expiry: '2026-02-30' } : lot)) }), /: lots\[2\]\.expiry: /],
    ['a bad vaccination date', (input) => ({ ...input, vaccinations: input.vaccinations.map((v, i) => (i === 0 ? { ...v, date: '05/02/2026' } : v)) }), /: vaccinations\[0\]\.date: /],
    ['a missing list', ({ vaccinations: _vaccinations, ...input }) => input, /: vaccinations: /],
    ['a negative overage', (input) => ({ ...input, overagePercent: -5 }), /: overagePercent: /],
  ];
  for (const [situation, change, message] of malformed) {
    it(`exits 2 naming the field for ${situation}`, async () => {
      const result = await run([await file('bad.json', JSON.stringify(change(farmFile)))]);
      expect(result.code).to.equal(2);
      expect(result.stderr).to.match(message);
      expect(result.stdout).to.equal('');
    });
  }
});
