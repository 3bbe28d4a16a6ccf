// Security headers from helmet, the strict Content-Security-Policy, and the session cookie's flags.
import { expect } from 'chai';
import request from 'supertest';
import { createApp } from '../../../api/app.js';
import { resetDatabase } from '../../support/test-database.js';
import { anonymousAgent, createTestUser, testApp, testContext, testPassword } from '../../support/test-app.js';

function directives(header: string): Map<string, string[]> {
  return new Map(header.split(';').map((part) => part.trim().split(/\s+/)).map(([name, ...values]) => [name, values]));
}

describe('security headers', () => {
  beforeEach(resetDatabase);

  it('sends a CSP that allows scripts only from our origin, no inline script, no framing, no plugins', async () => {
    const response = await request(testApp()).get('/api/health');
    const csp = directives(response.headers['content-security-policy']);
    expect(csp.get('script-src')).to.deep.equal(["'self'"]);
    expect(csp.get('script-src-attr')).to.deep.equal(["'none'"]);
    expect(csp.get('object-src')).to.deep.equal(["'none'"]);
    expect(csp.get('frame-ancestors')).to.deep.equal(["'none'"]);
    expect(csp.get('default-src')).to.deep.equal(["'self'"]);
    expect(response.headers['x-content-type-options']).to.equal('nosniff');
    expect(response.headers['referrer-policy']).to.equal('no-referrer');
    expect(response.headers).to.not.have.property('x-powered-by');
  });

  it('sets the session cookie httpOnly and SameSite=Lax, and the XSRF cookie readable by the page', async () => {
    const user = await createTestUser({ roles: ['crew'] });
    const { agent, csrf } = await anonymousAgent();
    const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email: user.email, password: testPassword });
    const cookies = response.headers['set-cookie'] as unknown as string[];
    const session = cookies.find((c) => c.startsWith('vialyard.sid='))!;
    expect(session).to.match(/HttpOnly/i).and.match(/SameSite=Lax/i);
    expect(session).to.not.match(/;\s*Secure/i);
    const xsrf = cookies.find((c) => c.startsWith('XSRF-TOKEN='))!;
    expect(xsrf).to.not.match(/HttpOnly/i);
  });

  it('marks the session cookie Secure when configured for HTTPS (behind a proxy that says so)', async () => {
    const context = testContext();
    const secureApp = createApp({ ...context, config: { ...context.config, COOKIE_SECURE: true } });
    const user = await createTestUser({ roles: ['crew'] });
    // The agent would not send Secure cookies over plain HTTP, so carry them by hand as a TLS-terminating proxy would.
    const session = await request(secureApp).get('/api/auth/session').set('X-Forwarded-Proto', 'https');
    const set = session.headers['set-cookie'] as unknown as string[];
    const cookieHeader = set.map((c) => c.split(';')[0]).join('; ');
    const csrf = decodeURIComponent(set.find((c) => c.startsWith('XSRF-TOKEN='))!.split(';')[0].slice('XSRF-TOKEN='.length));
    const response = await request(secureApp).post('/api/auth/sign-in').set('X-Forwarded-Proto', 'https').set('Cookie', cookieHeader)
      .set('X-XSRF-TOKEN', csrf).send({ email: user.email, password: testPassword });
    expect(response.status).to.equal(200);
    const cookie = (response.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('vialyard.sid='))!;
    expect(cookie).to.match(/;\s*Secure/i);
    expect(response.headers['strict-transport-security']).to.match(/max-age=\d+/);
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const response = await request(testApp()).get('/api/no-such-thing');
    expect(response.status).to.equal(404);
    expect(response.body.error.code).to.equal('not_found');
  });
});
