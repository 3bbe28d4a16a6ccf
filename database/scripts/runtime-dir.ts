// Where runtime data lives: one ignored folder in the checkout (cluster, mail, bench output, artifacts).
import { createHash } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** The ignored runtime folder, overridable with VIALYARD_RUNTIME_DIR. */
export function runtimeDir(...parts: string[]): string {
  const root = process.env.VIALYARD_RUNTIME_DIR ?? join(projectRoot, '.runtime');
  const dir = join(root, ...parts);
  mkdirSync(dir, { recursive: true });
  return dir;
}

/**
 * A folder under /var/tmp named after the checkout, for when the `postgres` system user
 * cannot traverse the checkout (for example a clone under /root).
 */
export function fallbackClusterRoot(): string {
  const tag = createHash('sha256').update(projectRoot).digest('hex').slice(0, 8);
  return join('/var/tmp', `vialyard-${basename(projectRoot)}-${tag}`);
}
