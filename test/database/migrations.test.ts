// Migrations run down to nothing and up again from zero, leaving the same tables.
import { expect } from 'chai';
import { createMigrator } from '../../database/migrator.js';
import { appRoleName, ownerConnection } from '../support/test-database.js';

async function tableNames(): Promise<string[]> {
  const [rows] = await ownerConnection().query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
  return (rows as { tablename: string }[]).map((row) => row.tablename);
}

describe('migrations', () => {
  it('go down to zero and up again from zero', async function () {
    this.timeout(60_000);
    const migrator = createMigrator(ownerConnection(), appRoleName());
    const before = await tableNames();
    expect(before).to.include.members(['users', 'sites', 'audit_log', 'session']);
    await migrator.down({ to: 0 });
    expect(await tableNames()).to.deep.equal(['schema_migrations']);
    expect(await migrator.executed()).to.have.length(0);
    await migrator.up();
    expect(await tableNames()).to.deep.equal(before);
    expect((await migrator.pending()).length).to.equal(0);
  });
});
