// `npm run bench`: logger import against psql's \copy, analysis throughput, the year chart query, planning at 2,000 and 4,000 flocks, client size.
import { spawnSync } from 'node:child_process';
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { QueryTypes } from 'sequelize';
import { importLogFile } from '../api/log-imports/import-log-file.js';
import { chartData } from '../api/readings/chart-query.js';
import { refreshReadingHours } from '../api/readings/refresh-reading-hours.js';
import { analyzeReadings } from '../shared/logs/analyze-readings.js';
import { readLogText } from '../shared/logs/read-log-text.js';
import { DEFAULT_STORAGE_RANGE } from '../shared/temperature/default-storage-range.js';
import { rangeInCelsius } from '../shared/temperature/temperature-range.js';
import { connectDatabase, Fridge, Logger, Site } from '../database/models/index.js';
import { ensurePostgresBinaries } from '../database/scripts/postgres-binaries.js';
import { runtimeDir } from '../database/scripts/runtime-dir.js';
import { ownerSequelize, startBenchDatabase } from './bench-cluster.js';
import { writeYearOfReadings } from './year-of-readings.js';
import { planningBench } from './planning-bench.js';
import { clientSize } from './client-size.js';
import { clientIndex, ensureClientBuilt } from '../database/scripts/client-build.js';
import { dirname } from 'node:path';

const log = (line: string) => process.stdout.write(`[bench] ${line}\n`);
const YEAR_START = Date.UTC(2025, 0, 1);
const DAY = 86_400_000;
const TARGET_RATIO = 1.5;
const ROUNDS = 3;

async function best<T>(runs: number, work: () => Promise<T> | T): Promise<{ ms: number; result: T }> {
  let fastest = Infinity;
  let result!: T;
  for (let i = 0; i < runs; i++) {
    const started = performance.now();
    result = await work();
    fastest = Math.min(fastest, performance.now() - started);
  }
  return { ms: fastest, result };
}

const round = (n: number, places = 1) => Math.round(n * 10 ** places) / 10 ** places;
const round1 = (n: number) => round(n);

async function main(): Promise<void> {
  const port = Number(process.env.VIALYARD_BENCH_PG_PORT ?? 5546);
  const dir = runtimeDir('bench');
  const bench = await startBenchDatabase(port, log);
  const sequelize = connectDatabase(bench.appUrl, { poolMax: 4 });
  const owner = ownerSequelize(bench);
  try {
    const file = join(dir, 'year-of-readings.csv');
    log('Writing one year of one-minute readings...');
    const rows = await writeYearOfReadings(file, YEAR_START);
    const size = statSync(file).size;
    log(`${rows.toLocaleString('en-US')} rows, ${(size / 1024 / 1024).toFixed(1)} MB`);

    const site = await Site.create({ code: 'BENCH', name: 'Bench site', timeZone: 'UTC' });
    const psql = join(ensurePostgresBinaries(), 'psql');
    const env = { ...process.env, PGHOST: '127.0.0.1', PGPORT: String(port), PGUSER: bench.credentials.ownerUser, PGPASSWORD: bench.credentials.ownerPassword, PGDATABASE: bench.credentials.database, PGOPTIONS: '-c timezone=UTC' };
    // Rounds alternate the two, each after a checkpoint; the best of each is compared, since other work on the
    // machine only ever makes a run slower.
    const copyRuns: number[] = [];
    const importRuns: number[] = [];
    let message = '';
    for (let round = 1; round <= ROUNDS; round++) {
      // psql's \copy of the same rows into a bare table with the same key: the floor for storing them at all.
      await owner.query(`CREATE TABLE bench_bare_${round} (logger_id integer NOT NULL DEFAULT 1, at timestamptz NOT NULL, temp_f real NOT NULL, PRIMARY KEY (logger_id, at))`);
      await bench.cluster.superuserQuery('CHECKPOINT', bench.credentials.database);
      const copyStarted = performance.now();
      const copied = spawnSync(psql, ['-X', '-q', '-v', 'ON_ERROR_STOP=1', '-c', `\\copy bench_bare_${round} (at, temp_f) FROM '${file}' WITH (FORMAT csv, HEADER true)`], { env, encoding: 'utf8' });
      copyRuns.push(performance.now() - copyStarted);
      if (copied.status !== 0) throw new Error(`psql \\copy failed: ${copied.stderr}`);

      const fridge = await Fridge.create({ siteId: site.id, code: `BENCH-F${round}`, name: `Bench fridge ${round}` });
      const logger = await Logger.create({ fridgeId: fridge.id, serial: `BENCH-${round}`, role: 'primary' });
      await bench.cluster.superuserQuery('CHECKPOINT', bench.credentials.database);
      const importStarted = performance.now();
      const outcome = await importLogFile(sequelize, { loggerId: logger.id, path: file, fileName: 'year-of-readings.csv', sizeBytes: size, actorId: null, source: 'cli', uploadsDir: dir });
      importRuns.push(performance.now() - importStarted);
      if (outcome.repeated || outcome.import.readingsStored !== rows) throw new Error(`the import stored ${outcome.repeated ? 0 : outcome.import.readingsStored} readings, expected ${rows}`);
      message = outcome.message;
      log(`round ${round}: psql \\copy ${round1(copyRuns[round - 1])} ms, import ${round1(importRuns[round - 1])} ms`);
    }
    const copyMs = Math.min(...copyRuns);
    const importMs = Math.min(...importRuns);
    const ratio = importMs / copyMs;
    log(`psql \\copy into a bare keyed table (best of ${ROUNDS}): ${round1(copyMs)} ms`);
    log(`Vialyard import, read + analyse + store + recompute (best of ${ROUNDS}): ${round1(importMs)} ms (${message})`);
    log(`ratio import / \\copy: ${round(ratio, 2)} (target ≤ ${TARGET_RATIO})`);

    const readings = readLogText(readFileSync(file, 'utf8'), { zone: 'UTC' }).readings;
    const limits = rangeInCelsius(DEFAULT_STORAGE_RANGE);
    const analysis = await best(5, () => analyzeReadings(readings, limits));
    const perSecond = readings.length / (analysis.ms / 1000);
    log(`analysis: ${readings.length.toLocaleString('en-US')} readings in ${round(analysis.ms)} ms = ${Math.round(perSecond).toLocaleString('en-US')} readings/s`);

    log('Storing five years of one-minute readings for a second fridge...');
    const fiveYears = await Fridge.create({ siteId: site.id, code: 'BENCH-5Y', name: 'Five-year fridge' });
    const longLogger = await Logger.create({ fridgeId: fiveYears.id, serial: 'BENCH-5Y', role: 'primary' });
    const fiveStart = Date.UTC(2021, 0, 1);
    const fiveEnd = fiveStart + 5 * 365 * DAY;
    await owner.query(
      `INSERT INTO readings (at, logger_id, temp_c)
       SELECT t, :logger, 4.5 + 0.8 * sin(extract(epoch FROM t) / 13751) FROM generate_series(:from::timestamptz, :to::timestamptz - interval '1 minute', interval '1 minute') AS t`,
      { replacements: { logger: longLogger.id, from: new Date(fiveStart).toISOString(), to: new Date(fiveEnd).toISOString() }, type: QueryTypes.INSERT },
    );
    await sequelize.transaction((t) => refreshReadingHours(sequelize, t, longLogger.id, fiveStart, fiveEnd));
    await owner.query('VACUUM ANALYZE readings, reading_hours');
    const yearFrom = new Date(fiveEnd - 365 * DAY);
    const chart = await best(5, () => chartData(sequelize, fiveYears.id, { from: yearFrom, to: new Date(fiveEnd) }));
    const points = chart.result.primary.buckets.length * 2 + chart.result.primary.points.length;
    log(`year chart on a fridge with five years stored: ${round(chart.ms)} ms, ${points} points (${chart.result.bucketMinutes / 60} h buckets)`);

    const planning = planningBench(log);
    ensureClientBuilt(log);
    const client = clientSize(dirname(clientIndex), log);

    const results = {
      at: new Date().toISOString(),
      planning,
      client,
      rows,
      fileMegabytes: round(size / 1024 / 1024, 2),
      psqlCopyMs: round(copyMs),
      importMs: round(importMs),
      psqlCopyRunsMs: copyRuns.map(round1),
      importRunsMs: importRuns.map(round1),
      ratio: round(ratio, 3),
      targetRatio: TARGET_RATIO,
      withinTarget: ratio <= TARGET_RATIO,
      analysisMs: round(analysis.ms),
      analysisReadingsPerSecond: Math.round(perSecond),
      yearChartMs: round(chart.ms, 2),
      yearChartPoints: points,
    };
    const out = join(dir, 'results.json');
    writeFileSync(out, `${JSON.stringify(results, null, 2)}\n`);
    log(`results written to ${out}`);
  } finally {
    await sequelize.close();
    await owner.close();
    bench.cluster.stop();
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.stack : String(error)}\n`);
  process.exit(1);
});
