// Builds the Angular client when its output is missing or older than any client or shared source file.
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { projectRoot } from './runtime-dir.js';

/** CLIENT_DIST_DIR (the folder holding index.html) lets two checkouts' builds live apart. */
const distDir = process.env.CLIENT_DIST_DIR ?? join(projectRoot, 'dist', 'client', 'browser');
export const clientIndex = join(distDir, 'index.html');

function newestChange(path: string): number {
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(path).reduce((newest, entry) => Math.max(newest, newestChange(join(path, entry))), stat.mtimeMs);
}

export function clientIsStale(): boolean {
  if (!existsSync(clientIndex)) return true;
  const built = statSync(clientIndex).mtimeMs;
  const sources = ['client', 'shared', 'angular.json', 'tsconfig.json'].map((p) => join(projectRoot, p)).filter(existsSync);
  return sources.some((source) => newestChange(source) > built);
}

export function buildClient(log: (line: string) => void): void {
  log('Building the client (Angular)...');
  const result = spawnSync(join(projectRoot, 'node_modules', '.bin', 'ng'), ['build', '--output-path', dirname(distDir)], {
    cwd: projectRoot,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) throw new Error('The client build failed (see the output above).');
}

export function ensureClientBuilt(log: (line: string) => void): void {
  if (clientIsStale()) buildClient(log);
}
