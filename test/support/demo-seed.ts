// Seeds the whole demo scenario once for a suite, as `npm start` does, with its uploads in a folder of their own that
// is removed afterwards; the database is emptied before and after.
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect } from 'chai';
import { PasswordHasher } from '../../api/auth/password-hasher.js';
import { seedDemoScenario } from '../../database/seeders/demo-scenario.js';
import { resetDatabase } from './test-database.js';
import { testContext } from './test-app.js';

/** Registers the suite's before/after hooks; `then` runs after the seeding, inside the same `before`. */
export function seedDemoForSuite(name: string, then?: () => Promise<void>): void {
  let uploads: string;
  const previousUploads = process.env.UPLOADS_DIR;
  before(async function () {
    this.timeout(180_000);
    await resetDatabase();
    uploads = await mkdtemp(join(tmpdir(), `vialyard-${name}-`));
    process.env.UPLOADS_DIR = uploads;
    // A low bcrypt cost: the demo's passwords are hashed for seven accounts and never guessed at here.
    const hasher = new PasswordHasher(4);
    expect(await seedDemoScenario(testContext().sequelize, (password) => hasher.hash(password))).to.equal(true);
    await then?.();
  });
  after(async () => {
    if (previousUploads === undefined) delete process.env.UPLOADS_DIR;
    else process.env.UPLOADS_DIR = previousUploads;
    await rm(uploads, { recursive: true, force: true });
    await resetDatabase();
  });
}
