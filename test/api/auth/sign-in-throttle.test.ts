// The sign-in throttle: per account and per address, counted in PostgreSQL, one generic failure message.
import { expect } from 'chai';
import { resetDatabase } from '../../support/test-database.js';
import { anonymousAgent, createTestUser, testContext, testPassword } from '../../support/test-app.js';

async function attempt(email: string, password: string, address = '127.0.0.1') {
  const { agent, csrf } = await anonymousAgent();
  return agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).set('X-Forwarded-For', address).send({ email, password });
}

describe('sign-in throttle', () => {
  beforeEach(resetDatabase);

  it('after the account limit of failures, refuses even the right password with 429 and Retry-After', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const limit = testContext().config.SIGN_IN_ACCOUNT_LIMIT;
    for (let i = 0; i < limit; i++) expect((await attempt(user.email, 'wrong password number ' + i)).status).to.equal(401);
    const blocked = await attempt(user.email, testPassword);
    expect(blocked.status).to.equal(429);
    expect(Number(blocked.headers['retry-after'])).to.be.greaterThan(0);
    expect(blocked.body.error.message).to.match(/Too many failed sign-ins/);
  });

  it('counts failures per account: another account from the same address still signs in', async () => {
    const victim = await createTestUser({ roles: ['crew'] });
    const other = await createTestUser({ roles: ['storage'] });
    for (let i = 0; i < testContext().config.SIGN_IN_ACCOUNT_LIMIT; i++) await attempt(victim.email, 'wrong password ' + i);
    expect((await attempt(other.email, testPassword)).status).to.equal(200);
  });

  it('counts failures per address across many accounts', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const limit = testContext().config.SIGN_IN_ADDRESS_LIMIT;
    for (let i = 0; i < limit; i++) await attempt(`guess${i}@test.example`, 'wrong password', '127.0.0.1');
    expect((await attempt(user.email, testPassword, '127.0.0.1')).status).to.equal(429);
  });

  it('keeps its counts in the database table every API process shares', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    await attempt(user.email, 'wrong password here');
    const [rows] = await testContext().sequelize.query(`SELECT key, points FROM sign_in_limits ORDER BY key`);
    expect(rows).to.deep.include({ key: `account:${user.email}`, points: 1 });
  });

  it('a successful sign-in clears the account count', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    await attempt(user.email, 'wrong password here');
    expect((await attempt(user.email, testPassword)).status).to.equal(200);
    const [rows] = await testContext().sequelize.query(`SELECT key FROM sign_in_limits WHERE key = 'account:${user.email}'`);
    expect(rows).to.have.length(0);
  });
});
