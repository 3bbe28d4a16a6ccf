// Streams rows to a COPY ... (FORMAT binary): no text to parse on the server, which is most of the cost of a text COPY.
import { once } from 'node:events';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';

export type BinaryField = 'timestamptz' | 'int4' | 'float4';

const SIGNATURE = Buffer.from('PGCOPY\n\xff\r\n\0', 'latin1');
/** PostgreSQL keeps timestamps as microseconds since 2000-01-01 UTC. */
const PG_EPOCH_MS = Date.UTC(2000, 0, 1);
const FIELD_BYTES: Record<BinaryField, number> = { timestamptz: 8, int4: 4, float4: 4 };
/** pg-copy-streams is fastest fed in chunks of this order rather than a write per row. */
const CHUNK_BYTES = 64 * 1024;

/**
 * `add` buffers a row and `flush`/`end` send it; the server's error, if any (e.g. a duplicate key), is kept in
 * `failure` and ends the stream, so the caller can roll back to a savepoint and take another path.
 */
export class BinaryCopyWriter {
  failure: (Error & { code?: string }) | null = null;
  private readonly stream: ReturnType<typeof copyFrom>;
  private readonly done: Promise<void>;
  private readonly rowBytes: number;
  private buffer: Buffer;
  private offset = 0;

  constructor(client: pg.ClientBase, sql: string, private readonly fields: readonly BinaryField[]) {
    this.stream = client.query(copyFrom(sql));
    this.done = new Promise<void>((resolve) => {
      this.stream.on('finish', resolve);
      this.stream.on('error', (error: Error) => {
        this.failure ??= error;
        resolve();
      });
    });
    this.rowBytes = 2 + fields.reduce((n, f) => n + 4 + FIELD_BYTES[f], 0);
    this.buffer = Buffer.allocUnsafe(Math.max(CHUNK_BYTES, this.rowBytes) + SIGNATURE.length + 8);
    SIGNATURE.copy(this.buffer, 0);
    this.buffer.writeInt32BE(0, 11);
    this.buffer.writeInt32BE(0, 15);
    this.offset = 19;
  }

  /** Values in field order: epoch ms for a timestamptz, numbers otherwise. */
  add(values: readonly number[]): void {
    if (this.offset + this.rowBytes > this.buffer.length) this.rotate();
    let o = this.buffer.writeInt16BE(this.fields.length, this.offset);
    for (let i = 0; i < this.fields.length; i++) {
      const field = this.fields[i];
      o = this.buffer.writeInt32BE(FIELD_BYTES[field], o);
      if (field === 'timestamptz') {
        // Microseconds stay below 2^53, so two 32-bit halves carry them without a BigInt per row.
        const micros = Math.round((values[i] - PG_EPOCH_MS) * 1000);
        const high = Math.floor(micros / 4_294_967_296);
        o = this.buffer.writeInt32BE(high, o);
        o = this.buffer.writeUInt32BE(micros - high * 4_294_967_296, o);
      }
      else if (field === 'int4') o = this.buffer.writeInt32BE(values[i], o);
      else o = this.buffer.writeFloatBE(values[i], o);
    }
    this.offset = o;
  }

  /** Sends what is buffered, waiting while the connection is saturated. */
  async flush(): Promise<void> {
    if (this.failure || this.offset === 0) return;
    const chunk = this.buffer.subarray(0, this.offset);
    this.buffer = Buffer.allocUnsafe(this.buffer.length);
    this.offset = 0;
    if (!this.stream.write(chunk)) await Promise.race([once(this.stream, 'drain'), this.done]);
  }

  /** Resolves with the server's error, or null once every row is in. */
  async end(): Promise<(Error & { code?: string }) | null> {
    if (!this.failure) {
      await this.flush();
      const trailer = Buffer.alloc(2);
      trailer.writeInt16BE(-1, 0);
      this.stream.end(trailer);
    }
    await this.done;
    return this.failure;
  }

  private rotate(): void {
    // Called between awaits only when a caller adds many rows without flushing: keep them all.
    const bigger = Buffer.allocUnsafe(this.buffer.length * 2);
    this.buffer.copy(bigger, 0, 0, this.offset);
    this.buffer = bigger;
  }
}
