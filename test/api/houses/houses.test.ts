// Houses through the API: who may keep them, field errors, the flock in each, and the audit trail.
import { expect } from 'chai';
import { AuditEntry, House } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse } from '../../support/flock-fixtures.js';

describe('houses', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('purchasing adds a house on a site, with an audit entry, and the crew reads it', async () => {
    const site = await createSite('NORTH');
    const buyer = await signInAs(['purchasing']);
    const response = await buyer.agent.post(`/api/houses/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'House 4', housing: 'aviary', capacity: 24_000 });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.deep.include({ name: 'House 4', housing: 'aviary', capacity: 24_000, active: true, currentFlock: null });
    expect(await AuditEntry.count({ where: { action: 'house.create', entityId: String(response.body.id) } })).to.equal(1);
    const crew = await signInAs(['crew'], [site]);
    const list = await crew.agent.get(`/api/houses/sites/${site.id}`).expect(200);
    expect(list.body.items.map((h: { name: string }) => h.name)).to.deep.equal(['House 4']);
    const refused = await crew.agent.post(`/api/houses/sites/${site.id}`).set('X-XSRF-TOKEN', crew.csrf).send({ name: 'House 5', housing: 'cage' });
    expect(refused.status).to.equal(403);
  });

  it('names each bad field: an unknown housing, a missing name, a capacity of zero', async () => {
    const site = await createSite('NORTH');
    const vet = await signInAs(['veterinarian']);
    const response = await vet.agent.post(`/api/houses/sites/${site.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ name: '', housing: 'barn', capacity: 0 });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.have.members(['name', 'housing', 'capacity']);
    expect(await House.count()).to.equal(0);
  });

  it('refuses a second house of the same name on a site (any case) with 409 on the name', async () => {
    const site = await createSite('NORTH');
    await createHouse(site, 'House 1');
    const admin = await signInAs(['admin']);
    const response = await admin.agent.post(`/api/houses/sites/${site.id}`).set('X-XSRF-TOKEN', admin.csrf).send({ name: 'house 1', housing: 'cage' });
    expect(response.status).to.equal(409);
    expect(response.body.error.fields[0].field).to.equal('name');
  });

  it('shows the flock placed in each house, and keeps a house with a flock in use', async () => {
    const site = await createSite('NORTH');
    const house = await createHouse(site, 'House 1');
    const flock = await createFlock(house, { name: 'H1-26A' });
    const admin = await signInAs(['admin']);
    const list = await admin.agent.get(`/api/houses/sites/${site.id}`).expect(200);
    expect(list.body.items[0].currentFlock).to.deep.equal({ id: flock.id, name: 'H1-26A' });
    const response = await admin.agent.put(`/api/houses/${house.id}`).set('X-XSRF-TOKEN', admin.csrf).send({ name: 'House 1', housing: 'cage', active: false });
    expect(response.status).to.equal(409);
    expect(response.body.error.fields[0].field).to.equal('active');
  });

  it('hides another site’s houses from a user limited to one site', async () => {
    const mine = await createSite('MINE');
    const theirs = await createSite('THEIRS');
    const house = await createHouse(theirs);
    const buyer = await signInAs(['purchasing'], [mine]);
    expect((await buyer.agent.get(`/api/houses/sites/${theirs.id}`)).status).to.equal(404);
    expect((await buyer.agent.put(`/api/houses/${house.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'X', housing: 'cage' })).status).to.equal(404);
  });
});
