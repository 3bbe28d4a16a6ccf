// Per-hour minimum, maximum, sum and count of readings as they stream in, written in one statement at the end.
import type { Transaction } from 'sequelize';
import { transactionClient } from './transaction-client.js';

const HOUR_MS = 3_600_000;

export class HourlyAggregate {
  private readonly hours = new Map<number, { min: number; max: number; sum: number; count: number }>();

  private lastHour = NaN;
  private last: { min: number; max: number; sum: number; count: number } | undefined;

  add(at: number, tempC: number): void {
    const hour = Math.floor(at / HOUR_MS) * HOUR_MS;
    // Readings come in time order, so the hour is nearly always the one before.
    const h = hour === this.lastHour ? this.last : this.hours.get(hour);
    if (h) {
      if (tempC < h.min) h.min = tempC;
      if (tempC > h.max) h.max = tempC;
      h.sum += tempC;
      h.count++;
    } else {
      this.last = { min: tempC, max: tempC, sum: tempC, count: 1 };
      this.lastHour = hour;
      this.hours.set(hour, this.last);
      return;
    }
    this.lastHour = hour;
    this.last = h;
  }

  /** Only for readings that were all new: they are added to what an hour already held. */
  async addTo(transaction: Transaction, loggerId: number): Promise<void> {
    if (!this.hours.size) return;
    const hours = [...this.hours.keys()];
    const h = hours.map((k) => this.hours.get(k)!);
    // Bound as arrays through the transaction's pg client: thousands of values are not worth formatting into SQL text.
    await transactionClient(transaction).query(
      `INSERT INTO reading_hours (logger_id, hour, min_c, max_c, sum_c, count)
       SELECT $1, to_timestamp(t.h::float8 / 1000), t.mn, t.mx, t.s, t.n
       FROM unnest($2::bigint[], $3::real[], $4::real[], $5::float8[], $6::int[]) AS t(h, mn, mx, s, n)
       ON CONFLICT (logger_id, hour) DO UPDATE SET
         min_c = least(reading_hours.min_c, EXCLUDED.min_c), max_c = greatest(reading_hours.max_c, EXCLUDED.max_c),
         sum_c = reading_hours.sum_c + EXCLUDED.sum_c, count = reading_hours.count + EXCLUDED.count`,
      [loggerId, hours, h.map((x) => x.min), h.map((x) => x.max), h.map((x) => x.sum), h.map((x) => x.count)],
    );
  }
}
