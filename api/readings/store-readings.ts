// Merges a file's readings with those stored: COPY into a staging table, then one INSERT ... ON CONFLICT, reporting repeats and conflicts.
import type { Transaction } from 'sequelize';
import type { ReadingConflict } from '../../shared/fridges/log-import-view.js';
import type { LogReading } from '../../shared/logs/log-reading.js';
import { BinaryCopyWriter } from './binary-copy-writer.js';
import { transactionClient } from './transaction-client.js';

/** Two values this close are the same reading written twice (a file's rounding, °F against °C). */
export const SAME_VALUE_TOLERANCE_C = 0.01;
const CONFLICT_SAMPLES = 100;

export interface StoreResult {
  stored: number;
  duplicates: number;
  conflicts: number;
  conflictSamples: ReadingConflict[];
  /** Whether the logger held readings inside the file's span before (then what is stored is a merge). */
  overlappedStored: boolean;
}

/** `readings` sorted by time with one per instant, as LogReader.finish gives them; runs inside the import's transaction. */
export async function storeReadings(transaction: Transaction, loggerId: number, readings: readonly LogReading[]): Promise<StoreResult> {
  const client = transactionClient(transaction);
  await client.query('CREATE TEMP TABLE import_staging (at timestamptz NOT NULL, temp_c real NOT NULL, line integer NOT NULL) ON COMMIT DROP');
  const writer = new BinaryCopyWriter(client, 'COPY import_staging (at, temp_c, line) FROM STDIN (FORMAT binary)', ['timestamptz', 'float4', 'int4']);
  for (let i = 0; i < readings.length; i++) {
    writer.add([readings[i].at, readings[i].tempC, readings[i].line]);
    if (i % 2048 === 2047) await writer.flush();
  }
  const failure = await writer.end();
  if (failure) throw failure;
  const first = readings[0].at;
  const last = readings[readings.length - 1].at;
  const overlap = await client.query(
    'SELECT 1 FROM readings WHERE logger_id = $1 AND at BETWEEN to_timestamp($2::float8 / 1000) AND to_timestamp($3::float8 / 1000) LIMIT 1',
    [loggerId, first, last],
  );
  let duplicates = 0;
  let conflicts = 0;
  let conflictSamples: ReadingConflict[] = [];
  if (overlap.rowCount) {
    const counts = await client.query<{ duplicates: string; conflicts: string }>(
      `SELECT count(*) FILTER (WHERE abs(r.temp_c - s.temp_c) <= $2) AS duplicates, count(*) FILTER (WHERE abs(r.temp_c - s.temp_c) > $2) AS conflicts
       FROM import_staging s JOIN readings r ON r.logger_id = $1 AND r.at = s.at`,
      [loggerId, SAME_VALUE_TOLERANCE_C],
    );
    duplicates = Number(counts.rows[0].duplicates);
    conflicts = Number(counts.rows[0].conflicts);
    if (conflicts) {
      const samples = await client.query<{ line: number; at: Date; file_c: number; stored_c: number }>(
        `SELECT s.line, s.at, s.temp_c AS file_c, r.temp_c AS stored_c
         FROM import_staging s JOIN readings r ON r.logger_id = $1 AND r.at = s.at
         WHERE abs(r.temp_c - s.temp_c) > $2 ORDER BY s.line LIMIT ${CONFLICT_SAMPLES}`,
        [loggerId, SAME_VALUE_TOLERANCE_C],
      );
      conflictSamples = samples.rows.map((r) => ({ line: r.line, at: new Date(r.at).toISOString(), fileC: r.file_c, storedC: r.stored_c }));
    }
  }
  const inserted = await client.query(
    'INSERT INTO readings (at, logger_id, temp_c) SELECT at, $1, temp_c FROM import_staging ON CONFLICT (logger_id, at) DO NOTHING',
    [loggerId],
  );
  await client.query('DROP TABLE import_staging');
  return { stored: inserted.rowCount ?? 0, duplicates, conflicts, conflictSamples, overlappedStored: overlap.rowCount !== 0 };
}
