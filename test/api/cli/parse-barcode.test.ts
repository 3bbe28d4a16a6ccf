import { expect } from 'chai';
import { PassThrough } from 'node:stream';
import { text } from 'node:stream/consumers';
import { command } from '../../../api/cli/commands/parse-barcode.js';

interface RunResult {
  code: number;
  stdout: string;
  stderr: string;
}

async function run(args: string[], stdinText = ''): Promise<RunResult> {
  const stdout = new PassThrough();
  const stderr = new PassThrough();
  const stdin = new PassThrough();
  // Start consuming before the command writes, and end the streams after it returns, so no output is missed.
  const out = text(stdout);
  const err = text(stderr);
  stdin.end(stdinText);
  const code = await command.run(args, { stdout, stderr, stdin });
  stdout.end();
  stderr.end();
  return { code, stdout: await out, stderr: await err };
}

describe('cli parse-barcode', () => {
  it('prints the parsed JSON and exits 0 for the BWIPP wiki "GS1 Application Identifier Standard Format" example', async () => {
    const result = await run(['(01)09521234543213(17)100101(10)123ABC(21)1234567890']);
    expect(result.code).to.equal(0);
    expect(result.stderr).to.equal('');
    expect(JSON.parse(result.stdout)).to.deep.equal({
      gtin: '09521234543213',
      lot: '123ABC',
      expiry: '2010-01-01',
      expiryDayGiven: true,
      serial: '1234567890',
      productionDate: null,
      ais: { '01': '09521234543213', '17': '100101', '10': '123ABC', '21': '1234567890' },
    });
  });

  it('prints null for every field a bare GTIN does not carry', async () => {
    const parsed = JSON.parse((await run(['6291041500213'])).stdout) as Record<string, unknown>;
    expect(parsed).to.deep.include({ gtin: '06291041500213', lot: null, expiry: null, expiryDayGiven: null, serial: null, productionDate: null });
  });

  it('reads raw scanner data with a ]d2 prefix and ASCII 29 from stdin when given "-" (Solidsoft GS1 parser wiki, "GS1 Data Example")', async () => {
    const result = await run(['-'], ']d2010506091751001110628S93R\u001d17241000218898847482518646\r\n');
    expect(result.code).to.equal(0);
    expect(JSON.parse(result.stdout)).to.include({ gtin: '05060917510011', lot: '628S93R', expiry: '2024-10-31', expiryDayGiven: false });
  });

  it('applies the century rule relative to --now', async () => {
    const early = JSON.parse((await run(['--now=2026-12-02', '(17)771231'])).stdout) as { expiry: string };
    const late = JSON.parse((await run(['--now=2030-01-01', '(17)771231'])).stdout) as { expiry: string };
    expect([early.expiry, late.expiry]).to.deep.equal(['1977-12-31', '2077-12-31']);
  });

  it('exits 2 with the reason on stderr and nothing on stdout for a bad check digit', async () => {
    const result = await run(['(01)09506000134353']);
    expect(result.code).to.equal(2);
    expect(result.stdout).to.equal('');
    expect(result.stderr).to.match(/wrong check digit/);
  });

  it('exits 2 naming an unknown AI', async () => {
    const result = await run(['(01)09506000134352(99)X']);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/unknown application identifier \(99\)/);
  });

  it('exits 2 for empty data', async () => {
    const result = await run(['']);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/empty/);
  });

  it('exits 2 with the usage when no barcode is given', async () => {
    const result = await run([]);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/usage: npm run cli -- parse-barcode/);
  });

  it('exits 2 for an impossible --now date', async () => {
    const result = await run(['--now=2026-02-31', '(17)271231']);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/--now must be a date/);
  });

  it('exits 2 for an unknown option', async () => {
    const result = await run(['--pretty', '(01)09506000134352']);
    expect(result.code).to.equal(2);
    expect(result.stderr).to.match(/unknown option --pretty/);
  });
});
