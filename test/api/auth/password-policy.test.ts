// The password policy (NIST SP 800-63B-4 §3.1.1.2: at least 15 characters, at least 64 allowed, a blocklist of
// common passwords) and bcrypt's 72-byte reach, as pure rules and through the API.
import { expect } from 'chai';
import { passwordMaxBytes, passwordShapeProblem } from '../../../shared/auth/password-policy.js';
import { isCommonPassword } from '../../../api/auth/common-passwords.js';
import { PasswordHasher } from '../../../api/auth/password-hasher.js';
import { readConfig } from '../../../api/config.js';
import { resetDatabase } from '../../support/test-database.js';
import { createTestUser, signIn, testPassword } from '../../support/test-app.js';

describe('password policy', () => {
  it('refuses 14 characters and accepts 15 (NIST SP 800-63B-4 minimum)', () => {
    expect(passwordShapeProblem('a'.repeat(13) + 'bc')).to.equal(null);
    expect(passwordShapeProblem('abcdefghijklmn')).to.match(/at least 15 characters \(this one has 14\)/);
  });

  it('allows 64 characters (NIST: at least 64 allowed) and 72 ASCII bytes', () => {
    expect(passwordShapeProblem('quiet harbour '.repeat(5).slice(0, 64))).to.equal(null);
    expect(passwordShapeProblem('x1y2z3'.repeat(12))).to.equal(null);
  });

  it('refuses more than 72 UTF-8 bytes, because bcrypt would ignore the rest (bcrypt reads 72 bytes)', () => {
    expect(passwordMaxBytes).to.equal(72);
    expect(passwordShapeProblem('p'.repeat(73))).to.match(/at most 72 bytes/);
    // 20 characters, but each "é" takes 2 bytes and each emoji 4: 20 emoji are 80 bytes.
    const emoji = '🐔🥚'.repeat(10);
    expect([...emoji].length).to.equal(20);
    expect(passwordShapeProblem(emoji)).to.match(/80 bytes in UTF-8/);
    expect(passwordShapeProblem('éè'.repeat(18))).to.equal(null);
    expect(passwordShapeProblem('éè'.repeat(18) + 'é')).to.match(/74 bytes/);
  });

  it('counts characters, not UTF-16 units, for the minimum', () => {
    const emoji = (count: number) => [...'🐔🥚'.repeat(10)].slice(0, count).join('');
    expect(passwordShapeProblem(emoji(15))).to.equal(null);
    expect(passwordShapeProblem(emoji(14))).to.match(/has 14/);
  });

  it('refuses passwords built around the account name or e-mail', () => {
    expect(passwordShapeProblem('greta.lindqvist1', { name: 'Greta Lindqvist', email: 'greta.lindqvist@x.example' })).to.match(/name, e-mail/);
  });

  it('finds common passwords from the @zxcvbn-ts/language-common list, also with digits appended', () => {
    expect(isCommonPassword('1qaz2wsx3edc4rfv')).to.equal(true);
    expect(isCommonPassword('123456789987654321')).to.equal(true);
    expect(isCommonPassword('sunshine12345678')).to.equal(true);
    expect(isCommonPassword('walnut ledger across the marsh')).to.equal(false);
  });
});

describe('bcrypt cost', () => {
  it('defaults to 12 when BCRYPT_COST is not set, and hashes carry that cost', async () => {
    const config = readConfig({ DATABASE_URL: 'postgres://a:b@127.0.0.1:1/x', SESSION_SECRET: 's'.repeat(32) });
    expect(config.BCRYPT_COST).to.equal(12);
    const hash = await new PasswordHasher(config.BCRYPT_COST).hash('walnut ledger across the marsh');
    expect(hash).to.match(/^\$2[aby]\$12\$/);
  });
});

describe('changing one\'s own password', () => {
  beforeEach(resetDatabase);

  it('needs the current password, applies the policy with field errors, then the new password signs in', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const { agent, csrf } = await signIn(user.email);
    const wrongCurrent = await agent.post('/api/auth/password').set('X-XSRF-TOKEN', csrf).send({ currentPassword: 'nope', newPassword: 'walnut ledger across the marsh' });
    expect(wrongCurrent.status).to.equal(400);
    expect(wrongCurrent.body.error.fields[0].field).to.equal('currentPassword');
    const short = await agent.post('/api/auth/password').set('X-XSRF-TOKEN', csrf).send({ currentPassword: testPassword, newPassword: 'short' });
    expect(short.body.error.fields[0]).to.include({ field: 'newPassword' });
    const common = await agent.post('/api/auth/password').set('X-XSRF-TOKEN', csrf).send({ currentPassword: testPassword, newPassword: '1qaz2wsx3edc4rfv' });
    expect(common.body.error.message).to.match(/commonly used/);
    await agent.post('/api/auth/password').set('X-XSRF-TOKEN', csrf).send({ currentPassword: testPassword, newPassword: 'walnut ledger across the marsh' }).expect(204);
    await signIn(user.email, 'walnut ledger across the marsh');
  });
});
