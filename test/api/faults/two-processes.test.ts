// Two API processes on two ports against one database: shared sessions, a shared sign-in throttle, and either serves alone.
import { expect } from 'chai';
import request from 'supertest';
import { resetDatabase } from '../../support/test-database.js';
import { cookieValue, createTestUser, testContext, testPassword } from '../../support/test-app.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';

function cookieHeader(setCookie: string[] | string | undefined): string {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  return list.map((cookie) => cookie.split(';')[0]).join('; ');
}

async function freshToken(url: string): Promise<{ cookie: string; csrf: string }> {
  const response = await request(url).get('/api/auth/session');
  return { cookie: cookieHeader(response.headers['set-cookie']), csrf: cookieValue(response.headers['set-cookie'], 'XSRF-TOKEN')! };
}

describe('two API processes', function () {
  this.timeout(90_000);
  let first: ServerProcess;
  let second: ServerProcess;

  before(async () => {
    await resetDatabase();
    const ports = [await freePort(), await freePort()];
    [first, second] = await Promise.all(ports.map((port) => startServerProcess(port)));
  });
  after(async () => {
    await Promise.all([first?.stop(), second?.stop()]);
  });

  it('a session made by signing in on one process works on the other, CSRF token included', async () => {
    const user = await createTestUser({ roles: ['storage'] });
    const anonymous = await freshToken(first.url);
    const signedIn = await request(first.url).post('/api/auth/sign-in').set('Cookie', anonymous.cookie).set('X-XSRF-TOKEN', anonymous.csrf)
      .send({ email: user.email, password: testPassword });
    expect(signedIn.status).to.equal(200);
    const cookie = cookieHeader(signedIn.headers['set-cookie']);
    const csrf = cookieValue(signedIn.headers['set-cookie'], 'XSRF-TOKEN')!;
    const onSecond = await request(second.url).get('/api/auth/session').set('Cookie', cookie);
    expect(onSecond.body.user?.id).to.equal(user.id);
    const change = await request(second.url).patch('/api/auth/preferences').set('Cookie', cookie).set('X-XSRF-TOKEN', csrf).send({ displayUnit: 'C' });
    expect(change.status).to.equal(200);
    expect(change.body.user.displayUnit).to.equal('C');
  });

  it('counts failed sign-ins across both processes', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const limit = testContext().config.SIGN_IN_ACCOUNT_LIMIT;
    for (let i = 0; i < limit; i++) {
      const url = i % 2 ? second.url : first.url;
      const token = await freshToken(url);
      const response = await request(url).post('/api/auth/sign-in').set('Cookie', token.cookie).set('X-XSRF-TOKEN', token.csrf).send({ email: user.email, password: `wrong ${i}` });
      expect(response.status).to.equal(401);
    }
    for (const url of [first.url, second.url]) {
      const token = await freshToken(url);
      const blocked = await request(url).post('/api/auth/sign-in').set('Cookie', token.cookie).set('X-XSRF-TOKEN', token.csrf).send({ email: user.email, password: testPassword });
      expect(blocked.status, url).to.equal(429);
    }
  });

  it('when one process stops, the other serves on with the same session', async () => {
    const user = await createTestUser({ roles: ['purchasing'] });
    const anonymous = await freshToken(second.url);
    const signedIn = await request(second.url).post('/api/auth/sign-in').set('Cookie', anonymous.cookie).set('X-XSRF-TOKEN', anonymous.csrf)
      .send({ email: user.email, password: testPassword });
    const cookie = cookieHeader(signedIn.headers['set-cookie']);
    await first.stop();
    const sites = await request(second.url).get('/api/sites').set('Cookie', cookie);
    expect(sites.status).to.equal(200);
    let refused = false;
    try {
      await fetch(`${first.url}/api/health`);
    } catch {
      refused = true;
    }
    expect(refused, 'the stopped process no longer answers').to.equal(true);
  });
});
