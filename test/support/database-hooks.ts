// Mocha root hooks for the database suites: migrate before the first test, close connections after the last.
import { closeOwnerConnection, migrateTestDatabase } from './test-database.js';
import { closeTestContext } from './test-app.js';

export const mochaHooks = {
  async beforeAll(this: Mocha.Context) {
    this.timeout(60_000);
    await migrateTestDatabase();
  },
  async afterAll() {
    await closeTestContext();
    await closeOwnerConnection();
  },
};
