// Mocha root hooks for the database suites: catch mail and migrate before the first test, close everything after the last.
import { closeOwnerConnection, migrateTestDatabase } from './test-database.js';
import { closeTestContext } from './test-app.js';
import { startMailCatcher, stopMailCatcher } from './mail-catcher.js';

// Before any spec file loads: some build the app at load time, and the app reads SMTP_PORT when it is built.
await startMailCatcher();

export const mochaHooks = {
  async beforeAll(this: Mocha.Context) {
    this.timeout(60_000);
    await migrateTestDatabase();
  },
  async afterAll() {
    await closeTestContext();
    await closeOwnerConnection();
    await stopMailCatcher();
  },
};
