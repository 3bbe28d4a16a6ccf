// Projected sites kept in memory between requests. A cached body is only ever served for the same data version (a
// database counter a trigger advances with every write to a table the projection reads, see the migration
// projection-data-version) and the same "today" on every site: each process checks the version on each request, so
// two API processes never serve a body older than the last committed write.
import { QueryTypes } from 'sequelize';
import { Site } from '../../database/models/index.js';

/** Bodies of a few recent keys (site sets × versions); older versions are dropped as soon as a newer one is seen. */
const MAX_ENTRIES = 32;

export class ProjectionCache<T> {
  private readonly entries = new Map<string, { version: string; value: Promise<T> }>();
  private newest = '';

  /**
   * The value under `key` at `version`, computing it once however many requests ask at the same time. A failure is
   * never kept: the next request computes again.
   */
  get(version: string, key: string, compute: () => Promise<T>): Promise<T> {
    const fullKey = `${version}|${key}`;
    const found = this.entries.get(fullKey);
    if (found) return found.value;
    if (BigInt(version) > BigInt(this.newest || '0')) {
      this.newest = version;
      for (const [k, entry] of this.entries) if (entry.version !== version) this.entries.delete(k);
    }
    const value = compute();
    this.entries.set(fullKey, { version, value });
    value.catch(() => this.entries.delete(fullKey));
    while (this.entries.size > MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value!);
    return value;
  }

  clear(): void {
    this.entries.clear();
    this.newest = '';
  }
}

/**
 * The committed data version, or null when the counter row is missing (an emptied database before its first write):
 * then nothing is cached. Read it BEFORE the data: a write committing in between makes the body newer than its
 * version, never older, and the next request sees the new version.
 */
export async function projectionDataVersion(): Promise<string | null> {
  const rows = await Site.sequelize!.query<{ version: string }>('SELECT version::text AS version FROM projection_data_version WHERE id = 1', {
    type: QueryTypes.SELECT,
  });
  return rows[0]?.version ?? null;
}

const serialized = new WeakMap<object, string>();

/**
 * The JSON text of a cached body, made once per body: large projections cost more to serialise than to look up. Only
 * for objects nobody changes after they are cached (a new data version makes new objects).
 */
export function cachedJson(body: object): string {
  let text = serialized.get(body);
  if (text === undefined) {
    text = JSON.stringify(body);
    serialized.set(body, text);
  }
  return text;
}
