// Keeps the hourly minimum/maximum table in step with a logger's readings over the hours a file touched.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

export async function refreshReadingHours(sequelize: Sequelize, transaction: Transaction, loggerId: number, from: number, to: number): Promise<void> {
  await sequelize.query(
    `INSERT INTO reading_hours (logger_id, hour, min_c, max_c, sum_c, count)
     SELECT :loggerId, date_trunc('hour', at, 'UTC'), min(temp_c), max(temp_c), sum(temp_c), count(*)
     FROM readings
     WHERE logger_id = :loggerId
       AND at >= date_trunc('hour', to_timestamp(:from::float8 / 1000), 'UTC')
       AND at < date_trunc('hour', to_timestamp(:to::float8 / 1000), 'UTC') + interval '1 hour'
     GROUP BY 2
     ON CONFLICT (logger_id, hour) DO UPDATE
       SET min_c = EXCLUDED.min_c, max_c = EXCLUDED.max_c, sum_c = EXCLUDED.sum_c, count = EXCLUDED.count`,
    { replacements: { loggerId, from, to }, type: QueryTypes.INSERT, transaction },
  );
}
