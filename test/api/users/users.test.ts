// User administration through the API: create, list, edit, with field errors and audit entries.
import { expect } from 'chai';
import { AuditEntry, User } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, createTestUser, signIn, signInAs } from '../../support/test-app.js';

const goodPassword = 'walnut ledger across the marsh';

describe('user administration', () => {
  beforeEach(resetDatabase);

  it('an admin creates a user limited to one site, and the audit log records it without the password', async () => {
    const site = await createSite('NORTH');
    const { agent, csrf, user: admin } = await signInAs(['admin']);
    const response = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf)
      .send({ email: 'New.Clerk@Test.example', name: 'New Clerk', roles: ['receiving', 'storage'], allSites: false, siteIds: [site.id], password: goodPassword });
    expect(response.status).to.equal(201);
    expect(response.body).to.include({ email: 'new.clerk@test.example', allSites: false, active: true });
    expect(response.body.siteIds).to.deep.equal([site.id]);
    const entry = await AuditEntry.findOne({ where: { action: 'user.create' } });
    expect(entry?.actorId).to.equal(admin.id);
    expect(JSON.stringify(entry?.after)).to.not.match(/password/i);
    await signIn('new.clerk@test.example', goodPassword);
  });

  it('refuses bad input with a field error for each field and stores nothing', async () => {
    const { agent, csrf } = await signInAs(['admin']);
    const response = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf)
      .send({ email: 'not-an-email', name: '', roles: ['wizard'], password: goodPassword });
    expect(response.status).to.equal(400);
    const fields = response.body.error.fields.map((f: { field: string }) => f.field);
    expect(fields).to.include.members(['email', 'name', 'roles.0']);
    expect(await User.count()).to.equal(1);
  });

  it('refuses a weak password, a duplicate e-mail, and a site choice with no site', async () => {
    await createTestUser({ email: 'taken@test.example', roles: ['crew'] });
    const { agent, csrf } = await signInAs(['admin']);
    const weak = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf).send({ email: 'a@test.example', name: 'A', roles: ['crew'], password: 'short one' });
    expect(weak.status).to.equal(400);
    expect(weak.body.error.fields[0].field).to.equal('password');
    const duplicate = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf).send({ email: 'taken@test.example', name: 'B', roles: ['crew'], password: goodPassword });
    expect(duplicate.status).to.equal(409);
    expect(duplicate.body.error.fields[0].field).to.equal('email');
    const noSite = await agent.post('/api/users').set('X-XSRF-TOKEN', csrf).send({ email: 'c@test.example', name: 'C', roles: ['crew'], allSites: false, siteIds: [], password: goodPassword });
    expect(noSite.body.error.fields[0].field).to.equal('siteIds');
    expect(await User.count()).to.equal(2);
  });

  it('lists users filtered, sorted and paged', async () => {
    for (const name of ['Cara', 'Abel', 'Bruno']) await createTestUser({ email: `${name.toLowerCase()}@test.example`, roles: ['crew'] });
    const { agent } = await signInAs(['admin']);
    const sorted = await agent.get('/api/users').query({ sort: 'email', direction: 'desc', pageSize: 2 });
    expect(sorted.body.total).to.equal(4);
    expect(sorted.body.items.map((u: { email: string }) => u.email)).to.have.length(2);
    expect(sorted.body.items[0].email >= sorted.body.items[1].email).to.equal(true);
    const filtered = await agent.get('/api/users').query({ search: 'bru' });
    expect(filtered.body.items.map((u: { email: string }) => u.email)).to.deep.equal(['bruno@test.example']);
    const badSort = await agent.get('/api/users').query({ sort: 'password_hash' });
    expect(badSort.status).to.equal(400);
    expect(badSort.body.error.fields[0].field).to.equal('sort');
  });

  it('an admin changes roles, sites and status; a deactivated user is signed out at the next request', async () => {
    const site = await createSite('SOUTH');
    const target = await createTestUser({ roles: ['crew'] });
    const targetSession = await signIn(target.email);
    const { agent, csrf } = await signInAs(['admin']);
    const response = await agent.patch(`/api/users/${target.id}`).set('X-XSRF-TOKEN', csrf).send({ roles: ['storage'], allSites: false, siteIds: [site.id] });
    expect(response.status).to.equal(200);
    expect(response.body).to.include({ allSites: false });
    expect(response.body.roles).to.deep.equal(['storage']);
    await agent.patch(`/api/users/${target.id}`).set('X-XSRF-TOKEN', csrf).send({ active: false }).expect(200);
    const after = await targetSession.agent.get('/api/sites');
    expect(after.status).to.equal(401);
    const audit = await AuditEntry.findAll({ where: { entity: 'user', entityId: String(target.id), action: 'user.update' } });
    expect(audit).to.have.length(2);
    expect((audit[0].before as { roles: string[] }).roles).to.deep.equal(['crew']);
  });

  it('an admin cannot deactivate themselves or drop their own admin role', async () => {
    const { agent, csrf, user } = await signInAs(['admin']);
    const response = await agent.patch(`/api/users/${user.id}`).set('X-XSRF-TOKEN', csrf).send({ active: false });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('active');
  });

  it('an unknown or malformed user id is a 404', async () => {
    const { agent, csrf } = await signInAs(['admin']);
    expect((await agent.patch('/api/users/999').set('X-XSRF-TOKEN', csrf).send({ name: 'X' })).status).to.equal(404);
    expect((await agent.patch('/api/users/abc').set('X-XSRF-TOKEN', csrf).send({ name: 'X' })).status).to.equal(404);
  });
});
