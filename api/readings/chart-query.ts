// The fridge chart's data: raw readings when few, else per-bucket minimum and maximum (so no peak is ever lost).
import { QueryTypes, type Sequelize } from 'sequelize';
import { CHART_MAX_POINTS, type ChartBucket, type ChartData, type ChartPoint, type ChartSeries } from '../../shared/fridges/chart-data.js';
import { Fridge, Logger } from '../../database/models/index.js';
import { fridgeLimits } from '../fridges/fridge-view.js';
import { AppError } from '../http/app-error.js';

const HOUR_MS = 3_600_000;
/** Each bucket gives two points. */
const MAX_BUCKETS = CHART_MAX_POINTS / 2;

interface Range {
  from: Date;
  to: Date;
}

const toPoint = (row: { at: Date; temp_c: number }): ChartPoint => ({ at: new Date(row.at).toISOString(), tempC: row.temp_c });
const toBucket = (row: { bucket: string; min_c: number; max_c: number; count: string }, widthMs: number): ChartBucket => ({
  at: new Date(Number(row.bucket) * widthMs).toISOString(),
  minC: row.min_c,
  maxC: row.max_c,
  count: Number(row.count),
});

async function primarySeries(sequelize: Sequelize, ids: number[], range: Range, bucketMs: number): Promise<ChartSeries> {
  const replacements = { ids: ids.length ? ids : [0], from: range.from.toISOString(), to: range.to.toISOString(), width: bucketMs / 1000 };
  if (bucketMs === 0) {
    const rows = await sequelize.query<{ at: Date; temp_c: number }>(
      'SELECT DISTINCT ON (at) at, temp_c FROM readings WHERE logger_id IN (:ids) AND at >= :from AND at <= :to ORDER BY at, logger_id',
      { replacements, type: QueryTypes.SELECT },
    );
    return { points: rows.map(toPoint), buckets: [] };
  }
  // Whole-hour buckets come from the hourly table: a year is 8,760 rows per logger instead of 525,600.
  const sql =
    bucketMs % HOUR_MS === 0
      ? `SELECT floor(extract(epoch FROM hour) / :width) AS bucket, min(min_c) AS min_c, max(max_c) AS max_c, sum(count) AS count
         FROM reading_hours WHERE logger_id IN (:ids) AND hour >= date_trunc('hour', :from::timestamptz, 'UTC') AND hour <= :to GROUP BY 1 ORDER BY 1`
      : `SELECT floor(extract(epoch FROM at) / :width) AS bucket, min(temp_c) AS min_c, max(temp_c) AS max_c, count(*) AS count
         FROM readings WHERE logger_id IN (:ids) AND at >= :from AND at <= :to GROUP BY 1 ORDER BY 1`;
  const rows = await sequelize.query<{ bucket: string; min_c: number; max_c: number; count: string }>(sql, { replacements, type: QueryTypes.SELECT });
  return { points: [], buckets: rows.map((row) => toBucket(row, bucketMs)) };
}

/** Backup readings count only where they fill a gap of the primary. */
async function backupSeries(sequelize: Sequelize, fridgeId: number, ids: number[], range: Range, bucketMs: number): Promise<ChartSeries> {
  if (!ids.length) return { points: [], buckets: [] };
  const replacements = { ids, fridgeId, from: range.from.toISOString(), to: range.to.toISOString(), width: (bucketMs || 60_000) / 1000 };
  const filled = `FROM readings r JOIN backup_fills f ON f.fridge_id = :fridgeId AND r.at >= f.starts_at AND r.at < f.ends_at
    WHERE r.logger_id IN (:ids) AND r.at >= :from AND r.at <= :to`;
  if (bucketMs === 0) {
    const rows = await sequelize.query<{ at: Date; temp_c: number }>(`SELECT DISTINCT ON (r.at) r.at, r.temp_c ${filled} ORDER BY r.at`, { replacements, type: QueryTypes.SELECT });
    return { points: rows.map(toPoint), buckets: [] };
  }
  const rows = await sequelize.query<{ bucket: string; min_c: number; max_c: number; count: string }>(
    `SELECT floor(extract(epoch FROM r.at) / :width) AS bucket, min(r.temp_c) AS min_c, max(r.temp_c) AS max_c, count(*) AS count ${filled} GROUP BY 1 ORDER BY 1`,
    { replacements, type: QueryTypes.SELECT },
  );
  return { points: [], buckets: rows.map((row) => toBucket(row, bucketMs)) };
}

/** 0 (raw) when the primary holds few enough readings in the range; else the narrowest width giving at most MAX_BUCKETS. */
export function bucketWidthMs(spanMs: number, readings: number): number {
  if (readings <= CHART_MAX_POINTS) return 0;
  const minutes = Math.ceil(spanMs / MAX_BUCKETS / 60_000);
  return minutes >= 60 ? Math.ceil(minutes / 60) * HOUR_MS : minutes * 60_000;
}

export async function chartData(sequelize: Sequelize, fridgeId: number, range: Range): Promise<ChartData> {
  if (!(range.to > range.from)) throw AppError.badRequest('The end of the range must be after its start.', [{ field: 'to', message: 'Must be after the start.' }]);
  const fridge = await Fridge.findByPk(fridgeId);
  if (!fridge) throw AppError.notFound('No such fridge.');
  const loggers = await Logger.findAll({ where: { fridgeId }, attributes: ['id', 'role'] });
  const primaryIds = loggers.filter((l) => l.role === 'primary').map((l) => l.id);
  const backupIds = loggers.filter((l) => l.role === 'backup').map((l) => l.id);
  const [counted] = await sequelize.query<{ n: string | null }>(
    `SELECT sum(count) AS n FROM reading_hours WHERE logger_id IN (:ids) AND hour >= date_trunc('hour', :from::timestamptz, 'UTC') AND hour <= :to`,
    { replacements: { ids: primaryIds.length ? primaryIds : [0], from: range.from.toISOString(), to: range.to.toISOString() }, type: QueryTypes.SELECT },
  );
  const width = bucketWidthMs(range.to.getTime() - range.from.getTime(), Number(counted?.n ?? 0));
  const limits = fridgeLimits(fridge);
  return {
    from: range.from.toISOString(),
    to: range.to.toISOString(),
    bucketMinutes: width / 60_000,
    lowC: limits.lowC,
    highC: limits.highC,
    primary: await primarySeries(sequelize, primaryIds, range, width),
    backup: await backupSeries(sequelize, fridgeId, backupIds, range, width),
  };
}
