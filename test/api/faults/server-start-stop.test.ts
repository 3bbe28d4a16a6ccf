// Starting and stopping the server process: partial uploads a killed process left behind are removed at start, and a
// SIGTERM answers the requests under way before the database pools end.
import { expect } from 'chai';
import { existsSync, mkdirSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { join } from 'node:path';
import type { Transaction } from 'sequelize';
import request from 'supertest';
import { runtimeDir } from '../../../database/scripts/runtime-dir.js';
import { signInRemote } from '../../support/remote-session.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';
import { createSite, createTestUser, testContext } from '../../support/test-app.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';

describe('server start and stop', function () {
  this.timeout(60_000);
  let server: ServerProcess | undefined;
  before(() => void testContext());
  afterEach(async () => {
    await server?.stop('SIGKILL');
    server = undefined;
  });

  it('removes partial uploads left in incoming by an earlier process, and keeps recent ones', async () => {
    const uploads = join(runtimeDir('test'), `uploads-start-${process.pid}`);
    rmSync(uploads, { recursive: true, force: true });
    const incoming = join(uploads, 'incoming');
    mkdirSync(incoming, { recursive: true });
    const old = join(incoming, 'left-by-a-killed-upload');
    writeFileSync(old, 'Time,Temperature\n2026-01-01T00:00:00Z,4.1\n');
    const hourAgo = new Date(Date.now() - 3_600_000);
    utimesSync(old, hourAgo, hourAgo);
    // Still being written (by another process sharing the folder, say): inside the grace period, so it stays.
    const recent = join(incoming, 'being-written');
    writeFileSync(recent, 'partial');
    server = await startServerProcess(await freePort(), { UPLOADS_DIR: uploads });
    expect(existsSync(old), 'the hour-old partial upload').to.equal(false);
    expect(existsSync(recent), 'the file written a moment ago').to.equal(true);
    rmSync(uploads, { recursive: true, force: true });
  });

  it('on SIGTERM answers the request under way, refuses new connections, then ends its pools and exits 0', async () => {
    await resetDatabase();
    await createSite('NORTH');
    const user = await createTestUser({ roles: ['admin'] });
    server = await startServerProcess(await freePort());
    const session = await signInRemote(server.url, user.email);
    // Hold the sites table so the request waits inside the database when the signal arrives.
    const lock: Transaction = await ownerConnection().transaction();
    let released = false;
    try {
      await ownerConnection().query('LOCK TABLE sites IN ACCESS EXCLUSIVE MODE', { transaction: lock });
      const answer = request(server.url).get('/api/sites').set('Cookie', session.cookie).then((r) => r);
      await waitFor(async () => {
        const [rows] = await ownerConnection().query(`SELECT 1 FROM pg_locks WHERE relation = 'sites'::regclass AND NOT granted`);
        return rows.length > 0;
      });
      const exited = new Promise<number | null>((resolve) => server!.child.once('exit', (code) => resolve(code)));
      server.child.kill('SIGTERM');
      await new Promise((resolve) => setTimeout(resolve, 500));
      expect(server.child.exitCode, 'still answering the request under way').to.equal(null);
      const refused = await fetch(`${server.url}/api/health`).then(() => false, () => true);
      expect(refused, 'a new connection after SIGTERM is refused').to.equal(true);
      await lock.commit();
      released = true;
      const response = await answer;
      expect(response.status).to.equal(200);
      expect(response.body.items.map((s: { code: string }) => s.code)).to.deep.equal(['NORTH']);
      expect(await exited).to.equal(0);
      expect(server.output()).not.to.match(/Cannot use a pool after calling end|Error/);
    } finally {
      if (!released) await lock.rollback();
    }
  });

  it('on SIGTERM lets a request its client gave up on finish before ending the pools (as when a load test stops)', async () => {
    await resetDatabase();
    await createSite('NORTH');
    const user = await createTestUser({ roles: ['admin'] });
    server = await startServerProcess(await freePort());
    const session = await signInRemote(server.url, user.email);
    const lock: Transaction = await ownerConnection().transaction();
    let released = false;
    try {
      await ownerConnection().query('LOCK TABLE sites IN ACCESS EXCLUSIVE MODE', { transaction: lock });
      const abandoned = httpRequest(`${server.url}/api/sites`, { headers: { cookie: session.cookie } });
      abandoned.on('error', () => undefined);
      abandoned.end();
      await waitFor(async () => {
        const [rows] = await ownerConnection().query(`SELECT 1 FROM pg_locks WHERE relation = 'sites'::regclass AND NOT granted`);
        return rows.length > 0;
      });
      abandoned.destroy();
      const exited = new Promise<number | null>((resolve) => server!.child.once('exit', (code) => resolve(code)));
      await new Promise((resolve) => setTimeout(resolve, 200));
      server.child.kill('SIGTERM');
      await new Promise((resolve) => setTimeout(resolve, 1000));
      expect(server.child.exitCode, 'still finishing the abandoned request').to.equal(null);
      await lock.commit();
      released = true;
      expect(await exited).to.equal(0);
      expect(server.output()).not.to.match(/Cannot use a pool after calling end|Error/);
    } finally {
      if (!released) await lock.rollback();
    }
  });
});

async function waitFor(check: () => Promise<boolean>, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error('timed out waiting');
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
