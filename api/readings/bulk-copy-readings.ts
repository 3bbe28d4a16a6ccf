// The fast path for a file's readings: a binary COPY straight into the readings table, inside a savepoint.
import type { Transaction } from 'sequelize';
import type { LogReading } from '../../shared/logs/log-reading.js';
import { BinaryCopyWriter } from './binary-copy-writer.js';
import { transactionClient } from './transaction-client.js';

/**
 * COPY writes pages at a time where an INSERT ... SELECT writes row by row (about 2.5 times slower on a year of
 * one-minute rows), so a file whose instants are all new goes straight in. The first instant already stored, or
 * repeated in the file, makes the COPY fail on the key; the savepoint then undoes it and the caller merges the
 * file through the staging table instead. Rows stream in as the file is read.
 */
export class BulkCopyReadings {
  private constructor(
    private readonly transaction: Transaction,
    private readonly writer: BinaryCopyWriter,
    private readonly loggerId: number,
  ) {}

  static async start(transaction: Transaction, loggerId: number): Promise<BulkCopyReadings> {
    const client = transactionClient(transaction);
    await client.query('SAVEPOINT bulk_readings');
    const writer = new BinaryCopyWriter(client, 'COPY readings (at, logger_id, temp_c) FROM STDIN (FORMAT binary)', ['timestamptz', 'int4', 'float4']);
    return new BulkCopyReadings(transaction, writer, loggerId);
  }

  async add(readings: readonly LogReading[]): Promise<void> {
    if (this.writer.failure) return;
    for (const r of readings) this.writer.add([r.at, this.loggerId, r.tempC]);
    await this.writer.flush();
  }

  /**
   * Closes the COPY and undoes it, for a file found unreadable half way: a connection left in COPY mode
   * would hold the transaction (and its locks) open forever.
   */
  async abandon(): Promise<void> {
    await this.writer.end();
    await transactionClient(this.transaction).query('ROLLBACK TO SAVEPOINT bulk_readings');
  }

  /** True when every row went in; false when some instant collided (and nothing of the COPY remains). */
  async finish(): Promise<boolean> {
    const failure = await this.writer.end();
    const client = transactionClient(this.transaction);
    if (!failure) {
      await client.query('RELEASE SAVEPOINT bulk_readings');
      return true;
    }
    await client.query('ROLLBACK TO SAVEPOINT bulk_readings');
    if (failure.code === '23505') return false;
    throw failure;
  }
}
