// Backups: a dump and an uploads archive restore into a fresh database and folder with every row and every file.
import { expect } from 'chai';
import { mkdtempSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Sequelize } from 'sequelize';
import { backup, restore } from '../../database/scripts/backup.js';
import { LocalCluster } from '../../database/scripts/local-cluster.js';
import { ownerConnection, resetDatabase, testEnv } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';
import { recordAudit } from '../../api/audit/record-audit.js';
import { testContext } from '../support/test-app.js';

async function rowCounts(connection: Sequelize): Promise<Record<string, number>> {
  const [tables] = await connection.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
  const counts: Record<string, number> = {};
  for (const { tablename } of tables as { tablename: string }[]) {
    const [rows] = await connection.query(`SELECT count(*)::int AS n FROM "${tablename}"`);
    counts[tablename] = (rows as { n: number }[])[0].n;
  }
  return counts;
}

describe('backup and restore', function () {
  // Registers the models first, so the file also runs alone or first.
  before(() => void testContext());
  this.timeout(60_000);
  const restoredName = 'vialyard_restore_check';
  let cluster: LocalCluster;

  before(() => {
    cluster = new LocalCluster({ name: 'test', port: Number(new URL(testEnv('DATABASE_URL')).port) });
  });
  after(async () => {
    await cluster.superuserQuery(`DROP DATABASE IF EXISTS ${restoredName}`);
  });

  it('restores into a fresh database and folder: every table has the same rows and every file the same bytes', async () => {
    await resetDatabase();
    const site = await createSite('BKP');
    await createTestUser({ roles: ['admin'], sites: [site] });
    await testContext().sequelize.transaction((t) => recordAudit({ actorId: null, action: 'test.backup', entity: 'test' }, t));
    const uploads = mkdtempSync(join(tmpdir(), 'vy-uploads-'));
    mkdirSync(join(uploads, 'photos'), { recursive: true });
    writeFileSync(join(uploads, 'photos', 'a.jpg'), Buffer.from([0xff, 0xd8, 0xff, 1, 2, 3]));
    writeFileSync(join(uploads, 'certificate.pdf'), '%PDF-1.4 test');

    const result = backup({ ownerUrl: testEnv('DATABASE_OWNER_URL'), uploadsDir: uploads, backupsDir: mkdtempSync(join(tmpdir(), 'vy-backups-')) });
    expect(result.folder).to.match(/vialyard-\d{4}-\d{2}-\d{2}T/);

    const ownerUser = decodeURIComponent(new URL(testEnv('DATABASE_OWNER_URL')).username);
    await cluster.superuserQuery(`DROP DATABASE IF EXISTS ${restoredName}`);
    await cluster.superuserQuery(`CREATE DATABASE ${restoredName} OWNER "${ownerUser}" TEMPLATE template0`);
    const restoredUrl = testEnv('DATABASE_OWNER_URL').replace(/\/[^/]+$/, `/${restoredName}`);
    const restoredUploads = mkdtempSync(join(tmpdir(), 'vy-restored-'));
    restore({ folder: result.folder, ownerUrl: restoredUrl, uploadsDir: restoredUploads });

    const restored = new Sequelize(restoredUrl, { logging: false });
    try {
      const original = await rowCounts(ownerConnection());
      expect(original.users).to.equal(1);
      expect(original.audit_log).to.equal(1);
      expect(await rowCounts(restored)).to.deep.equal(original);
      const [users] = await restored.query(`SELECT email, roles FROM users`);
      const [originalUsers] = await ownerConnection().query(`SELECT email, roles FROM users`);
      expect(users).to.deep.equal(originalUsers);
    } finally {
      await restored.close();
    }
    expect(readFileSync(join(restoredUploads, 'photos', 'a.jpg'))).to.deep.equal(Buffer.from([0xff, 0xd8, 0xff, 1, 2, 3]));
    expect(readFileSync(join(restoredUploads, 'certificate.pdf'), 'utf8')).to.equal('%PDF-1.4 test');
  });

  it('refuses a folder that is not a backup', () => {
    expect(() => restore({ folder: tmpdir(), ownerUrl: testEnv('DATABASE_OWNER_URL'), uploadsDir: tmpdir() })).to.throw(/Not a Vialyard backup folder/);
  });
});
