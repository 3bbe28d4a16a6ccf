// `npm test`: a throwaway PostgreSQL cluster, every mocha suite, then the browser suite in Chromium; non-zero on any failure.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { LocalCluster, databaseUrl } from '../database/scripts/local-cluster.js';
import { ensureClientBuilt } from '../database/scripts/client-build.js';
import { projectRoot, runtimeDir } from '../database/scripts/runtime-dir.js';
import { chromiumPath } from './support/browser.js';

const log = (line: string) => process.stdout.write(`[test] ${line}\n`);
const mocha = join(projectRoot, 'node_modules', '.bin', 'mocha');
const withDatabase = ['--require', 'test/support/database-hooks.ts'];

function ensureBrowserTools(): void {
  const missing = [
    ...(existsSync(chromiumPath) ? [] : ['chromium']),
    ...(existsSync('/usr/bin/pdftoppm') ? [] : ['poppler-utils']),
  ];
  if (!missing.length) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`Missing system packages: ${missing.join(', ')}. Install them with:\n  sudo apt-get install -y ${missing.join(' ')}`);
  }
  log(`Installing ${missing.join(', ')} from Debian's packages...`);
  spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  const result = spawnSync('apt-get', ['install', '-y', '-qq', ...missing], {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  if (result.status !== 0) throw new Error(`apt-get install ${missing.join(' ')} failed`);
}

function runMocha(label: string, args: string[], env: NodeJS.ProcessEnv): number {
  log(`Running ${label}...`);
  const result = spawnSync(mocha, args, { cwd: projectRoot, stdio: 'inherit', env });
  return result.status ?? 1;
}

async function main(): Promise<number> {
  const wanted = new Set((process.env.VIALYARD_TEST_SUITES ?? 'types,unit,database,e2e').split(','));
  ensureBrowserTools();
  const port = Number(process.env.VIALYARD_TEST_PG_PORT ?? 5545);
  const cluster = new LocalCluster({ name: 'test', port, throwaway: true, log });
  // Never reuse an earlier run's data: a throwaway cluster starts empty every time.
  cluster.destroy();
  cluster.start();
  try {
    const credentials = await cluster.ensureDatabase('vialyard_test');
    const env: NodeJS.ProcessEnv = {
      ...process.env,
      DATABASE_URL: databaseUrl(credentials, 'app'),
      DATABASE_OWNER_URL: databaseUrl(credentials, 'owner'),
      SESSION_SECRET: 'test-session-secret-that-is-long-enough-0123456789',
      BCRYPT_COST: '4',
      LOG_LEVEL: 'silent',
      VIALYARD_RUNTIME_DIR: runtimeDir(),
      // Stored photos of a test run go to the runtime folder, never into the checkout's uploads/.
      UPLOADS_DIR: runtimeDir('test-uploads'),
      NG_CLI_ANALYTICS: 'false',
    };
    const failures: string[] = [];
    // A contributor's quick loop: only the named test files (comma-separated globs), database hooks on.
    const onlyFiles = process.env.VIALYARD_TEST_FILES?.split(',').filter(Boolean);
    if (onlyFiles?.length) {
      if (onlyFiles.some((file) => file.includes('e2e'))) ensureClientBuilt(log);
      if (runMocha('the named files', [...withDatabase, '--timeout', '60000', ...onlyFiles], env)) failures.push('named files');
      log(failures.length ? `FAILED: ${failures.join(', ')}` : 'The named files passed.');
      return failures.length ? 1 : 0;
    }
    if (wanted.has('types')) {
      log('Type-checking api, shared, database and test...');
      const tsc = spawnSync(join(projectRoot, 'node_modules', '.bin', 'tsc'), ['-p', 'tsconfig.api.json', '--noEmit'], { cwd: projectRoot, stdio: 'inherit' });
      if (tsc.status !== 0) failures.push('types');
    }
    if (wanted.has('unit') && runMocha('the pure suites', ['test/shared/**/*.test.ts', 'test/api/cli/**/*.test.ts'], env)) failures.push('unit');
    if (wanted.has('database') && runMocha('the API and database suites', [...withDatabase, 'test/api/**/*.test.ts', 'test/database/**/*.test.ts', '--exclude', 'test/api/cli/**'], env)) failures.push('database');
    if (wanted.has('e2e')) {
      ensureClientBuilt(log);
      if (runMocha('the browser suite', [...withDatabase, '--timeout', '60000', 'test/e2e/**/*.test.ts'], env)) failures.push('e2e');
    }
    log(failures.length ? `FAILED: ${failures.join(', ')}` : 'All suites passed.');
    return failures.length ? 1 : 0;
  } finally {
    cluster.stop();
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
    process.exit(1);
  },
);
