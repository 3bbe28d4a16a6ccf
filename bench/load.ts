// `npm run bench:load -- --scale 0.05 --seconds 20 --connections 50`: seeds a large company (scale 1: 20 sites, 100 fridges with
// a year of five-minute readings, 2,000 flocks, 1,000 lots), starts the API as its own process and loads its read routes.
import { spawn } from 'node:child_process';
import { mkdirSync, openSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import bcrypt from 'bcryptjs';
import { roles, type Role } from '../shared/auth/roles.js';
import { connectDatabase, User } from '../database/models/index.js';
import { projectRoot, runtimeDir } from '../database/scripts/runtime-dir.js';
import { startBenchDatabase } from './bench-cluster.js';
import { checkDisk, companySize, seedCompany } from './company-seeder.js';
import { judge, runLoad, type LoadResult, type LoadTarget } from './load-bench.js';

const log = (line: string) => process.stdout.write(`[bench:load] ${line}\n`);
const PASSWORD = 'bench password that is long enough';

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

function cookieOf(response: Response): string {
  return response.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

async function signIn(url: string, email: string): Promise<string> {
  const anonymous = await fetch(`${url}/api/auth/session`);
  // express-session sends the last byte only once the new session is stored: read the whole answer before using it.
  await anonymous.text();
  const cookie = cookieOf(anonymous);
  const csrf = decodeURIComponent(/XSRF-TOKEN=([^;]+)/.exec(cookie)?.[1] ?? '');
  const signedIn = await fetch(`${url}/api/auth/sign-in`, { method: 'POST', headers: { cookie, 'x-xsrf-token': csrf, 'content-type': 'application/json' }, body: JSON.stringify({ email, password: PASSWORD }) });
  const body = await signedIn.text();
  if (signedIn.status !== 200) throw new Error(`sign-in as ${email} failed: ${signedIn.status} ${body}`);
  return cookieOf(signedIn);
}

async function main(): Promise<void> {
  const { values } = parseArgs({ options: { scale: { type: 'string', default: '0.05' }, seconds: { type: 'string', default: '20' }, connections: { type: 'string', default: '50' } } });
  const scale = Number(values.scale);
  const seconds = Number(values.seconds);
  const connections = Number(values.connections);
  const size = companySize(scale);
  log(`scale ${scale}: ${size.sites} sites, ${size.fridges} fridges, ${size.flocks} flocks, ${size.lots} lots; ${connections} connections × ${seconds} s per route`);
  const dir = runtimeDir('bench');
  mkdirSync(dir, { recursive: true });
  checkDisk(size, dir, log);

  const bench = await startBenchDatabase(Number(process.env.VIALYARD_BENCH_PG_PORT ?? 5546), log);
  const sequelize = connectDatabase(bench.appUrl, { poolMax: 4 });
  let server: ReturnType<typeof spawn> | undefined;
  try {
    const seedStarted = Date.now();
    const company = await seedCompany(sequelize, size, log);
    log(`seeded in ${((Date.now() - seedStarted) / 1000).toFixed(1)} s`);
    const passwordHash = await bcrypt.hash(PASSWORD, 4);
    for (const role of roles) await User.create({ email: `${role}@bench.example`, name: `Bench ${role}`, roles: [role], allSites: true, active: true, passwordHash });

    const port = await freePort();
    const url = `http://127.0.0.1:${port}`;
    server = spawn(process.execPath, ['--import', 'tsx', 'api/server.ts'], {
      cwd: projectRoot,
      // The server's own log goes to a file: autocannon's closing connections make its shutdown noisy.
      stdio: ['ignore', openSync(join(dir, 'load-server.log'), 'w'), openSync(join(dir, 'load-server.log'), 'a')],
      env: { ...process.env, VIALYARD_PORT: String(port), DATABASE_URL: bench.appUrl, SESSION_SECRET: 'bench-session-secret-long-enough-0123456789', LOG_LEVEL: 'warn', UPLOADS_DIR: join(dir, 'uploads'), SIGN_IN_ADDRESS_LIMIT: '1000' },
    });
    for (let i = 0; ; i++) {
      if (await fetch(`${url}/api/health`).then((r) => r.ok, () => false)) break;
      if (i > 150) throw new Error('the server did not start');
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    const cookies = {} as Record<Role, string>;
    for (const role of roles) cookies[role] = await signIn(url, `${role}@bench.example`);

    const to = new Date();
    const from = new Date(to.getTime() - 365 * 86_400_000);
    const today = to.toISOString().slice(0, 10);
    const targets: LoadTarget[] = [
      { name: 'trivial: the signed-in session', path: '/api/auth/session', cookie: cookies.storage },
      { name: "a fridge's year chart", path: `/api/readings/fridges/${company.fridgeIds[0]}/chart?from=${from.toISOString()}&to=${to.toISOString()}`, cookie: cookies.storage },
      { name: 'the lots list, filtered', path: `/api/lots?siteId=${company.siteIds[0]}&status=usable&sort=-vials`, cookie: cookies.purchasing },
      { name: 'planning projection of a site', path: `/api/demand/sites/${company.siteIds[0]}/projection`, cookie: cookies.purchasing },
      { name: 'home, admin: users', path: '/api/users?pageSize=1', cookie: cookies.admin },
      { name: 'home, receiving: expected', path: '/api/shipments/expected', cookie: cookies.receiving },
      { name: 'home, storage: fridges overview', path: '/api/fridges/overview', cookie: cookies.storage },
      { name: 'home, purchasing: overview', path: '/api/demand/overview', cookie: cookies.purchasing },
      { name: 'home, veterinarian: review queue', path: '/api/holds/queue', cookie: cookies.veterinarian },
      { name: 'home, crew: day sheet', path: `/api/vaccination-day/sheet?day=${today}`, cookie: cookies.crew },
    ];
    // A warm-up on the trivial route first (JIT, pools), discarded; the trivial route is measured again at the end and
    // the better of its two runs is the baseline, so a quieter moment of the machine never flatters the other routes.
    await runLoad(url, targets[0], connections, Math.min(5, seconds));
    const results: LoadResult[] = [];
    for (const target of [...targets, { ...targets[0], name: 'trivial, again at the end' }]) {
      // The first request of a route computes what the load then reads from the caches: its time is printed too.
      const probeStarted = performance.now();
      const probe = await fetch(`${url}${target.path}`, { headers: { cookie: target.cookie } });
      const bytes = (await probe.arrayBuffer()).byteLength;
      const firstMs = Math.round(performance.now() - probeStarted);
      if (!probe.ok) {
        log(`skipped ${target.name} (${target.path}): ${probe.status}`);
        continue;
      }
      const result = { ...(await runLoad(url, target, connections, seconds)), firstMs, bytes };
      results.push(result);
      log(`${target.name}: first request ${firstMs} ms (${bytes} bytes), then ${result.requestsPerSecond.toFixed(0)} req/s, p50 ${result.p50Ms} ms, p99 ${result.p99Ms} ms${result.non2xx || result.errors ? `, ${result.non2xx} non-2xx, ${result.errors} errors` : ''}`);
    }
    const trivialRuns = results.filter((r) => r.path === targets[0].path);
    const trivial = trivialRuns.reduce((a, b) => (b.requestsPerSecond > a.requestsPerSecond ? b : a));
    log('');
    log(`${'route'.padEnd(36)} ${'req/s'.padStart(8)} ${'p50'.padStart(6)} ${'p99'.padStart(6)} ${'× req/s'.padStart(8)} ${'× p99'.padStart(6)}  target`);
    const judged = results.map((result) => ({ ...result, ...judge(result, trivial) }));
    for (const r of judged) {
      log(`${r.name.padEnd(36)} ${r.requestsPerSecond.toFixed(0).padStart(8)} ${String(r.p50Ms).padStart(6)} ${String(r.p99Ms).padStart(6)} ${r.throughputRatio.toFixed(2).padStart(8)} ${r.p99Ratio.toFixed(1).padStart(6)}  ${r.ok ? 'met' : 'NOT met'}`);
    }
    const out = join(dir, 'load-results.json');
    writeFileSync(out, `${JSON.stringify({ at: new Date().toISOString(), scale, size, readings: company.readings, connections, seconds, results: judged }, null, 2)}\n`);
    log(`written to ${out}`);
  } finally {
    if (server && server.exitCode === null) {
      const exited = new Promise((resolve) => server!.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    await sequelize.close();
    bench.cluster.stop();
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`[bench:load] ${error instanceof Error ? error.stack : String(error)}\n`);
  process.exit(1);
});
