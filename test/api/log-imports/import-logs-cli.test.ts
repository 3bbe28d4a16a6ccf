// `npm run cli -- import-logs`: files into a fridge's logger from the command line, and a killed import leaves nothing.
import { expect } from 'chai';
import { spawn } from 'node:child_process';
import { QueryTypes } from 'sequelize';
import { LogImport } from '../../../database/models/index.js';
import { projectRoot } from '../../../database/scripts/runtime-dir.js';
import { importLogFile } from '../../../api/log-imports/import-log-file.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, testApp, testConfig, testContext } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, writeTempFile } from '../../support/fridge-fixtures.js';

const T0 = Date.UTC(2026, 2, 1, 8);

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

/** Runs the CLI in its own process (models bind to one Sequelize per process); `onStderr` may kill it. */
function cli(args: string[], onStderr?: (text: string, kill: () => void) => void): Promise<Run> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'api/cli/main.ts', ...args], { cwd: projectRoot, env: process.env });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString();
      onStderr?.(stderr, () => child.kill('SIGKILL'));
    });
    child.on('exit', (code) => resolve({ code, stdout, stderr }));
  });
}

async function readingCount(): Promise<number> {
  const [row] = await testContext().sequelize.query<{ n: string }>('SELECT count(*) AS n FROM readings', { type: QueryTypes.SELECT });
  return Number(row.n);
}

async function storedNothing(): Promise<void> {
  const { sequelize } = testContext();
  const tables = ['readings', 'reading_hours', 'log_imports', 'excursions', 'fridge_gaps', 'audit_log'];
  for (const table of tables) {
    const [row] = await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM ${table}`, { type: QueryTypes.SELECT });
    expect(Number(row.n), table).to.equal(0);
  }
}

describe('cli import-logs', function () {
  this.timeout(60_000);
  before(() => testApp());
  beforeEach(resetDatabase);

  it('imports files into the fridge’s primary logger, one transaction each, exit 2 when one is fatal', async () => {
    const fridge = await createFridge(await createSite('LKN'), { code: 'CLI-F1' });
    await createLogger(fridge, 'primary', 'P-1');
    const good = await writeTempFile('good.csv', celsiusCsv(series(T0, 10, [4, 9, 5])));
    const bad = await writeTempFile('bad.csv', 'Time,Note\n2026-03-01 08:00,ok\n2026-03-01 08:10,ok\n');
    const result = await cli(['import-logs', '--fridge', 'cli-f1', good, bad]);
    expect(result.code).to.equal(2);
    expect(result.stdout).to.match(/good\.csv: Stored 3 readings; 1 excursion opened\./);
    expect(result.stderr).to.match(/bad\.csv: cannot be imported: no temperature column found.*; nothing stored/);
    expect(await readingCount()).to.equal(3);
    expect((await LogImport.findOne())!).to.include({ source: 'cli', importedBy: null });
    const again = await cli(['import-logs', '--fridge', 'CLI-F1', good]);
    expect(again.code).to.equal(0);
    expect(again.stdout).to.match(/Nothing changed: this file \(same SHA-256\) was already imported/);
  });

  it('takes the logger, the unit and the columns from flags', async () => {
    const fridge = await createFridge(await createSite('LKN'), { code: 'CLI-F2' });
    await createLogger(fridge, 'primary', 'P-1');
    await createLogger(fridge, 'backup', 'B-7');
    const file = await writeTempFile('plain.csv', 'When,Reading,Other\n2026-03-01 08:00,40,9\n2026-03-01 08:10,41,9\n');
    const result = await cli(['import-logs', '--fridge', 'CLI-F2', '--logger', 'B-7', '--unit', 'F', '--tz', 'UTC', '--temp-column', 'Reading', file]);
    expect(result.code, result.stderr).to.equal(0);
    const [row] = await testContext().sequelize.query<{ serial: string; temp_c: number }>('SELECT l.serial, r.temp_c FROM readings r JOIN loggers l ON l.id = r.logger_id ORDER BY r.at LIMIT 1', { type: QueryTypes.SELECT });
    expect(row.serial).to.equal('B-7');
    expect(row.temp_c).to.be.closeTo(4.4444, 1e-4); // 40 °F, NIST SP 811
  });

  it('exits 2 on an unknown fridge, a missing file and bad flags', async () => {
    await createFridge(await createSite('LKN'), { code: 'CLI-F3' });
    expect((await cli(['import-logs', '--fridge', 'NOPE', 'x.csv'])).stderr).to.match(/no fridge with code 'NOPE'/);
    const noLogger = await cli(['import-logs', '--fridge', 'CLI-F3', 'x.csv']);
    expect([noLogger.code, noLogger.stderr]).to.deep.equal([2, 'fridge CLI-F3 has no primary logger in service; give --logger SERIAL\n']);
    const usage = await cli(['import-logs', 'x.csv']);
    expect(usage.code).to.equal(2);
    expect(usage.stderr).to.match(/--fridge CODE is required/);
  });

  it('leaves nothing stored when the process is killed in the middle of an import', async () => {
    const fridge = await createFridge(await createSite('LKN'), { code: 'CLI-F4' });
    await createLogger(fridge, 'primary', 'P-1');
    // 300,000 one-minute readings with a warm stretch, so storing and recomputing take a moment.
    const temps = Array.from({ length: 300_000 }, (_, i) => (i % 10_000 < 30 ? 9 : 4));
    const file = await writeTempFile('big.csv', celsiusCsv(series(T0, 1, temps)));
    let killedAt = '';
    const result = await cli(['import-logs', '--fridge', 'CLI-F4', file], (stderr, kill) => {
      // "analysing" is written inside the transaction, after the readings went in and before the commit.
      if (!killedAt && stderr.includes(': analysing')) {
        killedAt = 'analysing';
        kill();
      }
    });
    expect(killedAt).to.equal('analysing');
    expect(result.code).to.equal(null);
    expect(result.stdout).to.equal('');
    // The server rolls the transaction back once it sees the connection gone.
    const { sequelize } = testContext();
    for (let i = 0; i < 100; i++) {
      const [busy] = await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid() AND backend_xid IS NOT NULL`, { type: QueryTypes.SELECT });
      if (Number(busy.n) === 0) break;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    await storedNothing();
  });

  it('leaves nothing stored when an import fails after its readings went in', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const logger = await createLogger(fridge);
    const file = await writeTempFile('fails.csv', celsiusCsv(series(T0, 10, [4, 9, 9, 4])));
    const failing = importLogFile(testContext().sequelize, {
      loggerId: logger.id, path: file, fileName: 'fails.csv', sizeBytes: 100, actorId: null, source: 'cli', uploadsDir: testConfig().UPLOADS_DIR,
      progress: (p) => {
        if (p.phase === 'analysing') throw new Error('stopped halfway');
      },
    });
    let failure: unknown;
    await failing.catch((error) => (failure = error));
    expect((failure as Error).message).to.equal('stopped halfway');
    await storedNothing();
  });
});
