// Finds Debian's PostgreSQL server binaries, installing the package when we are root and they are missing.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';

const debianRoot = '/usr/lib/postgresql';
export const installCommand = 'apt-get update && apt-get install -y postgresql';

function findBinDir(): string | undefined {
  if (!existsSync(debianRoot)) return undefined;
  const versions = readdirSync(debianRoot)
    .filter((name) => /^\d+$/.test(name) && existsSync(join(debianRoot, name, 'bin', 'pg_ctl')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(debianRoot, versions[0], 'bin') : undefined;
}

export class MissingPostgresError extends Error {}

/** Returns the folder holding initdb and pg_ctl, or throws with the exact command to run. */
export function ensurePostgresBinaries(log: (line: string) => void = () => {}): string {
  const found = process.env.VIALYARD_PG_BIN ?? findBinDir();
  if (found) return found;
  if (process.getuid?.() !== 0) {
    throw new MissingPostgresError(
      `PostgreSQL server binaries were not found under ${debianRoot}. Install them as root with:\n  sudo sh -c '${installCommand}'`,
    );
  }
  log('PostgreSQL server not found: installing Debian\'s postgresql package...');
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  const install = spawnSync('apt-get', ['install', '-y', '-qq', 'postgresql'], {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  const dir = findBinDir();
  if (install.status !== 0 || !dir) throw new MissingPostgresError(`Installing postgresql failed; run: ${installCommand}`);
  return dir;
}
