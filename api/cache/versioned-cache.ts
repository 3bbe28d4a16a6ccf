// Bodies kept in memory between requests. A cached body is only ever served for the same data version (a database
// counter that triggers advance with every write to the tables it covers, see api/cache/data-versions.ts): each
// process checks the version on each request, so two API processes never serve a body older than the last committed
// write.
import { createHash } from 'node:crypto';
import type { Response } from 'express';

/** Bodies of a few recent keys; older versions are dropped as soon as a newer one is seen. */
const DEFAULT_MAX_ENTRIES = 32;

export class VersionedCache<T> {
  private readonly entries = new Map<string, { version: string; value: Promise<T> }>();
  private newest = '';

  constructor(private readonly maxEntries = DEFAULT_MAX_ENTRIES) {}

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
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
    return value;
  }

  clear(): void {
    this.entries.clear();
    this.newest = '';
  }
}

const serialized = new WeakMap<object, { text: string; etag: string }>();

/**
 * The JSON text of a cached body and its entity tag, made once per body: large bodies cost more to serialise (and
 * hash) than to look up. Only for objects nobody changes after they are cached (a new data version makes new objects).
 */
export function cachedJson(body: object): { text: string; etag: string } {
  let found = serialized.get(body);
  if (found === undefined) {
    const text = JSON.stringify(body);
    found = { text, etag: `W/"${createHash('sha1').update(text).digest('base64url')}"` };
    serialized.set(body, found);
  }
  return found;
}

/** Sends a cached body; Express answers 304 itself when the browser's If-None-Match names this tag. */
export function sendCachedJson(res: Response, body: object): void {
  const { text, etag } = cachedJson(body);
  res.set('ETag', etag).type('application/json').send(text);
}
