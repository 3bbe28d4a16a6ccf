// Backups: pg_dump in custom format plus a tar.gz of the uploads folder, side by side in a timestamped folder; and their restore.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ensurePostgresBinaries } from './postgres-binaries.js';

export interface BackupResult {
  folder: string;
  databaseFile: string;
  uploadsFile: string;
}

function run(command: string, args: string[], what: string): void {
  const result = spawnSync(command, args, { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${what} failed:\n${result.stderr || result.stdout}`);
}

function stamp(date = new Date()): string {
  return date.toISOString().replace(/[:.]/g, '-');
}

export function backup(options: { ownerUrl: string; uploadsDir: string; backupsDir: string; now?: Date }): BackupResult {
  const bin = ensurePostgresBinaries();
  const folder = join(options.backupsDir, `vialyard-${stamp(options.now)}`);
  mkdirSync(folder, { recursive: true });
  const databaseFile = join(folder, 'database.dump');
  const uploadsFile = join(folder, 'uploads.tar.gz');
  run(join(bin, 'pg_dump'), ['--format=custom', '--no-owner', `--file=${databaseFile}`, `--dbname=${options.ownerUrl}`], 'pg_dump');
  mkdirSync(options.uploadsDir, { recursive: true });
  // Stored files only; the placeholder that keeps the folder in git is not data.
  const entries = readdirSync(options.uploadsDir).filter((name) => name !== '.gitkeep');
  run('tar', ['-czf', uploadsFile, '-C', options.uploadsDir, '--', ...(entries.length ? entries : ['--files-from=/dev/null'])], 'tar');
  return { folder, databaseFile, uploadsFile };
}

/**
 * Restores a backup folder into an empty database (connected as the role that will own the tables)
 * and an uploads folder. Refuses a database that already has tables, so nothing is mixed.
 */
export function restore(options: { folder: string; ownerUrl: string; uploadsDir: string }): void {
  const bin = ensurePostgresBinaries();
  const databaseFile = join(options.folder, 'database.dump');
  const uploadsFile = join(options.folder, 'uploads.tar.gz');
  for (const file of [databaseFile, uploadsFile]) {
    if (!existsSync(file)) throw new Error(`Not a Vialyard backup folder: ${file} is missing.`);
  }
  run(join(bin, 'pg_restore'), ['--exit-on-error', '--no-owner', '--single-transaction', `--dbname=${options.ownerUrl}`, databaseFile], 'pg_restore');
  mkdirSync(options.uploadsDir, { recursive: true });
  run('tar', ['-xzf', uploadsFile, '-C', options.uploadsDir], 'tar');
}
