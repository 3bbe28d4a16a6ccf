// The audit log is append-only for the application: its role holds only INSERT and SELECT on the table.
import { expect } from 'chai';
import { Sequelize } from 'sequelize';
import { resetDatabase, testEnv } from '../support/test-database.js';

describe('audit log privileges', () => {
  let asApp: Sequelize;
  before(() => {
    asApp = new Sequelize(testEnv('DATABASE_URL'), { logging: false, pool: { max: 1 } });
  });
  after(() => asApp.close());
  beforeEach(resetDatabase);

  async function refusal(sql: string): Promise<string | undefined> {
    try {
      await asApp.query(sql);
      return undefined;
    } catch (error) {
      return (error as { parent?: { code?: string } }).parent?.code;
    }
  }

  it('the application role may insert and read entries', async () => {
    await asApp.query(`INSERT INTO audit_log (action, entity) VALUES ('test.insert', 'test')`);
    const [rows] = await asApp.query(`SELECT action FROM audit_log`);
    expect(rows).to.deep.equal([{ action: 'test.insert' }]);
  });

  it('the application role is refused UPDATE, DELETE and TRUNCATE (SQLSTATE 42501)', async () => {
    await asApp.query(`INSERT INTO audit_log (action, entity) VALUES ('test.keep', 'test')`);
    expect(await refusal(`UPDATE audit_log SET action = 'changed'`)).to.equal('42501');
    expect(await refusal(`DELETE FROM audit_log`)).to.equal('42501');
    expect(await refusal(`TRUNCATE audit_log`)).to.equal('42501');
    const [rows] = await asApp.query(`SELECT action FROM audit_log`);
    expect(rows).to.deep.equal([{ action: 'test.keep' }]);
  });

  it('the application role does not own the table', async () => {
    const [rows] = await asApp.query(`SELECT tableowner FROM pg_tables WHERE tablename = 'audit_log'`);
    const appUser = decodeURIComponent(new URL(testEnv('DATABASE_URL')).username);
    expect((rows as { tableowner: string }[])[0].tableowner).to.not.equal(appUser);
  });
});
