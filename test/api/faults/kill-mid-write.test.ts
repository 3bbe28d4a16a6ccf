// A server killed with SIGKILL in the middle of a logger import or a receiving submission: after a restart nothing of it is
// stored, and sending it again succeeds. The write is caught mid-transaction by holding the audit table, which each of these
// transactions writes last: the server's INSERT waits there with everything else already done, and is killed waiting.
import { expect } from 'chai';
import { readdirSync, rmSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { join } from 'node:path';
import type { Transaction } from 'sequelize';
import request from 'supertest';
import { createFridge as createLoggedFridge, createLogger } from '../../support/fridge-fixtures.js';
import { createCatalogue, createFridge, lineInput, makeJpeg, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles, receivingCounts } from '../../support/receiving-state.js';
import { signInRemote, type RemoteSession } from '../../support/remote-session.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';
import { createSite, createTestUser, testApp, testConfig } from '../../support/test-app.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';

const ROWS = 50_000;
const T0 = Date.UTC(2026, 0, 1);

function loggerFile(rows = ROWS): Buffer {
  const lines = ['Time,Temperature (°C)'];
  for (let i = 0; i < rows; i++) lines.push(`${new Date(T0 + i * 60_000).toISOString()},${(4 + (i % 7) * 0.1).toFixed(1)}`);
  return Buffer.from(lines.join('\n') + '\n');
}

async function count(sql: string, replacements: Record<string, unknown> = {}): Promise<number> {
  const [rows] = await ownerConnection().query(sql, { replacements });
  return Number((rows as { n: number | string }[])[0].n);
}

/** Holds the audit table against inserts (reads go on) until released. */
async function holdAuditTable(): Promise<Transaction> {
  const transaction = await ownerConnection().transaction();
  await ownerConnection().query('LOCK TABLE audit_log IN EXCLUSIVE MODE', { transaction });
  return transaction;
}

/** pg_locks shows every role's waits (pg_stat_activity hides other roles' queries from a role that is not superuser). */
const blockedOnAudit = `SELECT pid FROM pg_locks WHERE relation = 'audit_log'::regclass AND NOT granted`;

/**
 * Waits until a server connection is blocked inserting into the audit table, and returns the tables its open
 * transaction has written to (a RowExclusiveLock is taken by each INSERT and held to the transaction's end).
 */
async function waitForBlockedAuditInsert(): Promise<string[]> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const [rows] = await ownerConnection().query(blockedOnAudit);
    const pid = (rows as { pid: number }[])[0]?.pid;
    if (pid) {
      const [locks] = await ownerConnection().query(
        `SELECT DISTINCT relation::regclass::text AS name FROM pg_locks WHERE pid = :pid AND mode = 'RowExclusiveLock' AND granted AND relation IS NOT NULL`,
        { replacements: { pid } },
      );
      return (locks as { name: string }[]).map((lock) => lock.name);
    }
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error('the server never reached its audit insert');
}

/** Once the killed server's connections are gone, nothing of its transaction can still commit. */
async function waitForKilledTransactionGone(): Promise<void> {
  const deadline = Date.now() + 10_000;
  const open = `SELECT count(*) AS n FROM pg_locks WHERE relation = 'audit_log'::regclass AND mode = 'RowExclusiveLock'`;
  while ((await count(open)) > 0 && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 50));
  expect(await count(open), 'the killed server\'s transaction has ended').to.equal(0);
}

describe('SIGKILL in the middle of a write', function () {
  this.timeout(90_000);
  let server: ServerProcess;
  let storage: RemoteSession;
  let clerk: RemoteSession;
  let loggerId: number;
  let siteId: number;
  let line: () => ReturnType<typeof lineInput>;

  const start = async () => (server = await startServerProcess(await freePort()));
  const post = (who: RemoteSession, path: string) => request(server.url).post(path).set('Cookie', who.cookie).set('X-XSRF-TOKEN', who.csrf);
  const kill = () => server.stop('SIGKILL');

  before(async () => {
    testApp(); // models bind when the test process's context is made
    await resetDatabase();
    clearPhotoFiles();
    const site = await createSite('KILL');
    siteId = site.id;
    loggerId = (await createLogger(await createLoggedFridge(site))).id;
    const fridge = await createFridge(site, 'KILL-F1');
    const catalogue = await createCatalogue();
    line = () => lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id });
    const storageUser = await createTestUser({ roles: ['storage'] });
    const clerkUser = await createTestUser({ roles: ['receiving'], sites: [site] });
    await start();
    storage = await signInRemote(server.url, storageUser.email);
    clerk = await signInRemote(server.url, clerkUser.email);
  });
  after(async () => {
    await server?.stop();
  });

  const importCounts = async () => ({
    readings: await count('SELECT count(*) AS n FROM readings WHERE logger_id = :loggerId', { loggerId }),
    hours: await count('SELECT count(*) AS n FROM reading_hours WHERE logger_id = :loggerId', { loggerId }),
    imports: await count('SELECT count(*) AS n FROM log_imports WHERE logger_id = :loggerId', { loggerId }),
    excursions: await count('SELECT count(*) AS n FROM excursions'),
    audit: await count(`SELECT count(*) AS n FROM audit_log WHERE action = 'log-import.create'`),
  });
  const nothingImported = { readings: 0, hours: 0, imports: 0, excursions: 0, audit: 0 };

  it('killed while a logger file is still arriving: nothing stored', async () => {
    const file = loggerFile();
    const boundary = 'vialyard-kill-boundary';
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="year.csv"\r\nContent-Type: text/csv\r\n\r\n`);
    const url = new URL(`/api/log-imports/loggers/${loggerId}`, server.url);
    const upload = httpRequest(url, {
      method: 'POST',
      headers: { Cookie: storage.cookie, 'X-XSRF-TOKEN': storage.csrf, 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Content-Length': head.length + file.length + boundary.length + 8 },
    });
    const ended = new Promise((resolve) => {
      upload.on('error', resolve);
      upload.on('response', resolve);
    });
    const incoming = join(testConfig().UPLOADS_DIR, 'incoming');
    const before = new Set(readdirSync(incoming));
    upload.write(head);
    upload.write(file.subarray(0, file.length / 2)); // half the file, and the rest never comes
    await new Promise((resolve) => setTimeout(resolve, 300));
    await kill();
    await ended;
    await start();
    expect(await importCounts()).to.deep.equal(nothingImported);
    // The half-received file stays in the incoming folder (nothing refers to it); tidy it away.
    for (const name of readdirSync(incoming)) if (!before.has(name)) rmSync(join(incoming, name), { force: true });
  });

  it('killed inside the import transaction (readings copied, audit entry waiting): nothing stored; the same file then imports', async () => {
    const file = loggerFile();
    const hold = await holdAuditTable();
    const upload = post(storage, `/api/log-imports/loggers/${loggerId}`).attach('file', file, 'year.csv').then(
      (response) => response,
      (error: unknown) => error,
    );
    try {
      const written = await waitForBlockedAuditInsert();
      expect(written, 'the killed transaction had written these').to.include.members(['readings', 'reading_hours', 'log_imports']);
      await kill();
    } finally {
      await hold.rollback();
    }
    await upload;
    await waitForKilledTransactionGone();
    expect(await importCounts()).to.deep.equal(nothingImported);

    await start();
    const again = await post(storage, `/api/log-imports/loggers/${loggerId}`).attach('file', file, 'year.csv');
    expect(again.status, JSON.stringify(again.body).slice(0, 300)).to.equal(201);
    expect(again.body.import.readingsStored).to.equal(ROWS);
    expect(await importCounts()).to.include({ readings: ROWS, imports: 1, audit: 1 });
  });

  it('killed inside a receiving transaction (shipment, lots, movements and photo rows written, audit entry waiting): no row stays; sending it again succeeds', async () => {
    const empty = await receivingCounts();
    const shipment = shipmentInput([line(), line()]);
    const photo = await makeJpeg(640, 480);
    const send = () => post(clerk, `/api/shipments/sites/${siteId}`).field('shipment', JSON.stringify(shipment)).attach('photos', photo, { filename: 'box.jpg', contentType: 'image/jpeg' });
    const hold = await holdAuditTable();
    const submission = send().then(
      (response) => response,
      (error: unknown) => error,
    );
    try {
      const written = await waitForBlockedAuditInsert();
      expect(written, 'the killed transaction had written these').to.include.members(['shipments', 'shipment_lines', 'lots', 'stock_movements', 'shipment_photos']);
      await kill();
    } finally {
      await hold.rollback();
    }
    await submission;
    await waitForKilledTransactionGone();
    const afterKill = await receivingCounts();
    // Photo files are written before the transaction and removed if it fails; a process killed in between can only
    // leave files no row points at (see DEVELOPERS.md, Photos), never a row without its file.
    expect({ ...afterKill, photoFiles: 0 }).to.deep.equal({ ...empty, photoFiles: 0 });
    expect(afterKill.photoFiles - empty.photoFiles).to.be.at.most(2);

    await start();
    const again = await send();
    expect(again.status, JSON.stringify(again.body).slice(0, 300)).to.equal(201);
    const stored = await receivingCounts();
    expect(stored).to.include({ shipments: empty.shipments + 1, shipment_lines: empty.shipment_lines + 2, lots: empty.lots + 2, stock_movements: empty.stock_movements + 2, shipment_photos: empty.shipment_photos + 1 });
  });
});
