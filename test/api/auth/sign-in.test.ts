// Sign-in, sign-out, session renewal and CSRF through the real HTTP layer.
import { expect } from 'chai';
import request from 'supertest';
import { AuditEntry } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { anonymousAgent, cookieValue, createTestUser, signIn, testApp, testPassword } from '../../support/test-app.js';

describe('sign-in', () => {
  beforeEach(resetDatabase);

  it('with the right e-mail and password, answers with the user and a session cookie', async () => {
    const user = await createTestUser({ email: 'clerk@test.example', roles: ['receiving'] });
    const { agent, csrf } = await anonymousAgent();
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: 'Clerk@Test.example ', password: testPassword });
    expect(response.status).to.equal(200);
    expect(response.body.user).to.include({ id: user.id, email: 'clerk@test.example' });
    expect(response.body.user).to.not.have.property('passwordHash');
    const session = await agent.get('/api/auth/session').expect(200);
    expect(session.body.user.id).to.equal(user.id);
  });

  it('with a wrong password or an unknown e-mail, gives the same generic message', async () => {
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'] });
    const { agent, csrf } = await anonymousAgent();
    const wrong = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: 'clerk@test.example', password: 'not the password at all' });
    const unknown = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: 'nobody@test.example', password: testPassword });
    expect(wrong.status).to.equal(401);
    expect(unknown.status).to.equal(401);
    expect(wrong.body.error.message).to.equal(unknown.body.error.message);
    expect(wrong.body.error.message).to.match(/e-mail or password/);
  });

  it('refuses a deactivated account with the same generic message', async () => {
    await createTestUser({ email: 'gone@test.example', roles: ['crew'], active: false });
    const { agent, csrf } = await anonymousAgent();
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: 'gone@test.example', password: testPassword });
    expect(response.status).to.equal(401);
  });

  it('names the missing field when the body is incomplete', async () => {
    const { agent, csrf } = await anonymousAgent();
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: 'a@test.example' });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['password']);
    expect(response.body.error.message).to.match(/^The sign-in is not valid: password: /);
  });

  it('answers a malformed JSON body with 400, not 500', async () => {
    const { agent, csrf } = await anonymousAgent();
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).set('Content-Type', 'application/json').send('{"email":');
    expect(response.status).to.equal(400);
    expect(response.body.error.message).to.match(/not valid JSON/);
  });

  it('gives a new session id at sign-in, so an id planted before it is worthless', async () => {
    const user = await createTestUser({ roles: ['storage'] });
    const { agent, csrf } = await anonymousAgent();
    const before = await agent.get('/api/auth/session');
    const plantedId = cookieValue(before.headers['set-cookie'], 'vialyard.sid') ?? '';
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: user.email, password: testPassword });
    const newId = cookieValue(response.headers['set-cookie'], 'vialyard.sid');
    expect(newId, 'a session cookie is set at sign-in').to.be.a('string');
    expect(newId).to.not.equal(plantedId);
    // The planted id does not carry the signed-in user.
    const withPlanted = await request(testApp()).get('/api/auth/session').set('Cookie', `vialyard.sid=${encodeURIComponent(plantedId)}`);
    expect(withPlanted.body.user).to.equal(null);
  });

  it('sign-out destroys the session: the old cookie no longer signs anyone in', async () => {
    const user = await createTestUser({ roles: ['purchasing'] });
    const { agent, csrf } = await signIn(user.email);
    const session = await agent.get('/api/auth/session');
    const cookie = `vialyard.sid=${encodeURIComponent(cookieValue(session.headers['set-cookie'], 'vialyard.sid') ?? '')}`;
    await agent.post('/api/auth/sign-out').set('X-XSRF-TOKEN', csrf).expect(204);
    const after = await agent.get('/api/auth/session');
    expect(after.body.user).to.equal(null);
    const replay = await request(testApp()).get('/api/sites').set('Cookie', cookie);
    expect(replay.status).to.equal(401);
  });
});

describe('CSRF protection', () => {
  beforeEach(resetDatabase);

  it('refuses a state-changing request without the token, and one with a wrong token', async () => {
    const user = await createTestUser({ roles: ['admin'] });
    const { agent } = await signIn(user.email);
    const body = { email: 'new@test.example', name: 'New', roles: ['crew'], password: 'a long enough passphrase here' };
    const missing = await agent.post('/api/users').send(body);
    const wrong = await agent.post('/api/users').set('X-XSRF-TOKEN', 'f'.repeat(64)).send(body);
    expect(missing.status).to.equal(403);
    expect(missing.body.error.code).to.equal('csrf');
    expect(wrong.status).to.equal(403);
    expect(await AuditEntry.count({ where: { action: 'user.create' } })).to.equal(0);
  });

  it('refuses a sign-in without the token (login CSRF)', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const response = await request(testApp()).post('/api/auth/sign-in').send({ email: user.email, password: testPassword });
    expect(response.status).to.equal(403);
  });

  it('accepts the same request with the token from the XSRF-TOKEN cookie', async () => {
    const user = await createTestUser({ roles: ['admin'] });
    const { agent, csrf } = await signIn(user.email);
    const response = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf)
      .send({ email: 'new@test.example', name: 'New', roles: ['crew'], password: 'a long enough passphrase here' });
    expect(response.status).to.equal(201);
  });
});
