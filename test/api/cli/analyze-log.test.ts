import { expect } from 'chai';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PassThrough } from 'node:stream';
import { text } from 'node:stream/consumers';
import { fileURLToPath } from 'node:url';
import { command } from '../../../api/cli/commands/analyze-log.js';
import { meanKineticTemperatureC } from '../../../shared/logs/mean-kinetic-temperature.js';

const SMALL = fileURLToPath(new URL('../../fixtures/logs/cli-small.csv', import.meta.url));

async function run(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const [stdout, stderr, stdin] = [new PassThrough(), new PassThrough(), new PassThrough()];
  const out = text(stdout);
  const err = text(stderr);
  stdin.end();
  const code = await command.run(args, { stdout, stderr, stdin });
  stdout.end();
  stderr.end();
  return { code, stdout: await out, stderr: await err };
}

describe('cli analyze-log', () => {
  let dir = '';
  before(async () => {
    dir = await mkdtemp(join(tmpdir(), 'analyze-log-'));
  });
  after(async () => {
    await rm(dir, { recursive: true, force: true });
  });
  const write = async (name: string, body: string) => {
    const path = join(dir, name);
    await writeFile(path, body);
    return path;
  };

  // The fixture's temperatures in °C (NIST SP 811: (F − 32)/1.8): 4.444, 8, 8.5, 5, —, 1.5, 2;
  // readings every 10 min with a 20-min gap before 09:00. Figures below are hand-computed.
  it('prints one JSON object with the analysis of a small file against 35–45 °F in UTC', async () => {
    const result = await run([SMALL]);
    expect(result.code).to.equal(0);
    expect(result.stderr).to.equal('');
    const mkt = meanKineticTemperatureC([40, 46.4, 47.3, 41, 34.7, 35.6].map((f) => (f - 32) / 1.8));
    expect(JSON.parse(result.stdout)).to.deep.equal({
      unit: 'F',
      readings: 6,
      skipped: 1,
      first: '2026-03-01T08:00:00.000Z',
      last: '2026-03-01T09:10:00.000Z',
      intervalMinutes: 10,
      lowC: 1.667, // 35 °F, NIST SP 811
      highC: 7.222, // 45 °F, NIST SP 811
      minC: 1.5,
      maxC: 8.5,
      meanC: 4.907, // hand-computed: 294.444 °C·min / 60 min
      mktC: Math.round(mkt * 1000) / 1000, // every reading stands for 10 min, so equal weights
      minutesInRange: 30,
      minutesAbove: 20,
      minutesBelow: 10,
      gapMinutes: 20,
      excursions: [
        // hand-computed: (8 − 7.2222) × 10 + (8.5 − 7.2222) × 10
        { kind: 'high', start: '2026-03-01T08:10:00.000Z', end: '2026-03-01T08:30:00.000Z', minutes: 20, peakC: 8.5, degreeMinutesC: 20.556 },
        // hand-computed: (1.6667 − 1.5) × 10
        { kind: 'low', start: '2026-03-01T09:00:00.000Z', end: '2026-03-01T09:10:00.000Z', minutes: 10, peakC: 1.5, degreeMinutesC: 1.667 },
      ],
      gaps: [{ start: '2026-03-01T08:40:00.000Z', end: '2026-03-01T09:00:00.000Z', minutes: 20 }],
      warnings: [{ line: 7, message: 'temperature is empty; row skipped' }],
    });
  });

  it('reads local times in the zone given by --tz', async () => {
    const output = JSON.parse((await run([SMALL, '--tz', 'America/Chicago'])).stdout);
    expect(output.first).to.equal('2026-03-01T14:00:00.000Z'); // IANA tz: CST −06:00
  });

  it('takes limits in °C, counting 8 °C as in range for a 2–8 °C limit', async () => {
    const output = JSON.parse((await run([SMALL, '--low', '2', '--high', '8', '--limits-unit', 'C'])).stdout);
    expect([output.lowC, output.highC]).to.deep.equal([2, 8]); // CDC Vaccine Storage and Handling Toolkit range
    expect(output.excursions.map((e: { kind: string; minutes: number }) => [e.kind, e.minutes])).to.deep.equal([
      ['high', 10], // only 8.5 °C; hand-computed
      ['low', 10], // 1.5 °C; 2 °C is on the limit
    ]);
  });

  it('takes the unit and the columns from flags when the header does not tell', async () => {
    const path = await write('plain.csv', 'When,Reading,Other\n2026-03-01 08:00,4,9\n2026-03-01 08:10,5,9\n');
    const output = JSON.parse((await run([path, '--unit', 'C', '--time-column', 'When', '--temp-column', 'Reading'])).stdout);
    expect(output).to.deep.include({ unit: 'C', readings: 2, minC: 4, maxC: 5 });
  });

  it('exits 2 with the reason on stderr when the unit is unknown, naming the flag', async () => {
    const path = await write('no-unit.csv', 'Time,Temperature\n2026-03-01 08:00,4\n2026-03-01 08:10,5\n');
    const result = await run([path]);
    expect(result.code).to.equal(2);
    expect(result.stdout).to.equal('');
    expect(result.stderr).to.match(/temperature unit unknown/).and.match(/--unit F\|C/);
  });

  it('exits 2 on an ambiguous date order and on fewer than two readable rows', async () => {
    const ambiguous = await write('ambiguous.csv', 'Time,Temp °C\n03/04/2026 10:00,4\n03/04/2026 10:10,5\n');
    const ambiguousResult = await run([ambiguous]);
    expect(ambiguousResult.code).to.equal(2);
    expect(ambiguousResult.stderr).to.match(/--date-order/);
    const single = await write('single.csv', 'Time,Temp °C\n2026-03-01 08:00,4\n');
    const singleResult = await run([single]);
    expect(singleResult.code).to.equal(2);
    expect(singleResult.stderr).to.match(/fewer than two readable rows/);
  });

  it('exits 2 when there is no header row', async () => {
    const path = await write('headless.csv', '2026-03-01 08:00,4\n2026-03-01 08:10,5\n');
    const result = await run([path, '--unit', 'C']);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/no header row found/);
  });

  it('exits 2 with a clear message for a file that does not exist', async () => {
    const result = await run([join(dir, 'missing.csv')]);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/missing\.csv: cannot read it: no such file/);
  });

  it('exits 2 on bad flags, with the usage', async () => {
    const bad = [
      [SMALL, '--unit', 'K'],
      [SMALL, '--low', '2'],
      [SMALL, '--low', '9', '--high', '1'],
      [SMALL, '--limits-unit', 'C'],
      [SMALL, '--tz', 'Nowhere/Else'],
      [SMALL, '--frobnicate'],
      [],
    ];
    for (const args of bad) {
      const result = await run(args);
      expect(result.code, args.join(' ')).to.equal(2);
      expect(result.stderr, args.join(' ')).to.not.equal('');
    }
  });
});
