// Loads a fridge's stored readings over a span, primary and backup apart, through COPY (a row per reading is the slow part).
import { to as copyTo } from 'pg-copy-streams';
import type { Transaction } from 'sequelize';
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import { transactionClient } from './transaction-client.js';

export interface FridgeLoggerRef {
  id: number;
  role: 'primary' | 'backup';
}

export interface FridgeReadings {
  primary: readonly TimedReading[];
  backup: readonly TimedReading[];
}

/**
 * Readings with `from <= at <= to` (epoch ms), sorted by time within each role. Where two loggers of one role
 * hold the same instant (a replaced primary overlapping its successor), the first is kept.
 */
export async function loadFridgeReadings(transaction: Transaction, loggers: readonly FridgeLoggerRef[], from: number, to: number): Promise<FridgeReadings> {
  const result = { primary: [] as TimedReading[], backup: [] as TimedReading[] };
  if (!loggers.length || !(from <= to)) return result;
  const roleOf = new Map(loggers.map((l) => [l.id, l.role]));
  const ids = loggers.map((l) => Math.trunc(l.id)).join(',');
  // COPY takes no parameters; every value here is a number we made.
  const sql = `COPY (SELECT (extract(epoch FROM at) * 1000)::bigint, temp_c, logger_id FROM readings
    WHERE logger_id IN (${ids}) AND at >= to_timestamp(${Math.floor(from)}::float8 / 1000) AND at <= to_timestamp(${Math.ceil(to)}::float8 / 1000)
    ORDER BY at, logger_id) TO STDOUT`;
  const stream = transactionClient(transaction).query(copyTo(sql));
  let rest = '';
  const take = (line: string) => {
    const tab1 = line.indexOf('\t');
    const tab2 = line.indexOf('\t', tab1 + 1);
    const reading = { at: Number(line.slice(0, tab1)), tempC: Number(line.slice(tab1 + 1, tab2)) };
    const list = roleOf.get(Number(line.slice(tab2 + 1))) === 'backup' ? result.backup : result.primary;
    if (list.length && list[list.length - 1].at === reading.at) return;
    list.push(reading);
  };
  for await (const chunk of stream) {
    const text = rest + (chunk as Buffer).toString('utf8');
    let start = 0;
    for (let end = text.indexOf('\n'); end !== -1; end = text.indexOf('\n', start)) {
      take(text.slice(start, end));
      start = end + 1;
    }
    rest = text.slice(start);
  }
  if (rest) take(rest);
  return result;
}
