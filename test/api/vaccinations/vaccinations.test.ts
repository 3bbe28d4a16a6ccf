// Vaccinations by hand through the API: added, moved, cancelled; dates outside the flock's life refused, naming the field.
import { expect } from 'chai';
import { AuditEntry } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createProduct, createVaccination, siteDay } from '../../support/flock-fixtures.js';

describe('vaccinations', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('adds one by hand with the flock’s age on the day, and refuses dates in the past, before placement or at depletion', async () => {
    const site = await createSite('NORTH');
    const flock = await createFlock(await createHouse(site), { hatchDays: -50, placementDays: -40, depletionDays: 60 });
    const product = await createProduct();
    const buyer = await signInAs(['purchasing']);
    const post = (plannedDate: string) =>
      buyer.agent.post(`/api/vaccinations/flocks/${flock.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ productId: product.id, plannedDate, route: 'drinking_water', notes: 'Booster' });
    const created = await post(siteDay(site, 10));
    expect(created.status, JSON.stringify(created.body)).to.equal(201);
    expect(created.body).to.include({ ageDays: 60, status: 'planned', fromProgramme: false, route: 'drinking_water' });
    expect(await AuditEntry.count({ where: { action: 'vaccination.create' } })).to.equal(1);
    for (const days of [-1, 60, 61]) {
      const refused = await post(siteDay(site, days));
      expect(refused.status, `day ${days}`).to.equal(400);
      expect(refused.body.error.fields[0].field).to.equal('plannedDate');
    }
    const unknown = await buyer.agent.post(`/api/vaccinations/flocks/${flock.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ productId: 999, plannedDate: siteDay(site, 3), route: 'spray' });
    expect(unknown.body.error.fields[0].field).to.equal('productId');
  });

  it('cancels with a reason, after which the vaccination no longer changes', async () => {
    const site = await createSite('NORTH');
    const flock = await createFlock(await createHouse(site));
    const vaccination = await createVaccination(flock, await createProduct(), siteDay(site, 5));
    const vet = await signInAs(['veterinarian']);
    expect((await vet.agent.post(`/api/vaccinations/${vaccination.id}/cancel`).set('X-XSRF-TOKEN', vet.csrf).send({})).body.error.fields[0].field).to.equal('reason');
    const cancelled = await vet.agent.post(`/api/vaccinations/${vaccination.id}/cancel`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Flock health: postponed by the veterinarian.' });
    expect(cancelled.body).to.include({ status: 'cancelled', cancelReason: 'Flock health: postponed by the veterinarian.' });
    expect((await vet.agent.patch(`/api/vaccinations/${vaccination.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ plannedDate: siteDay(site, 6) })).status).to.equal(409);
  });

  it('lets the crew read the vaccinations of their site but not change them', async () => {
    const site = await createSite('NORTH');
    const flock = await createFlock(await createHouse(site));
    const vaccination = await createVaccination(flock, await createProduct(), siteDay(site, 5));
    const crew = await signInAs(['crew'], [site]);
    expect((await crew.agent.get(`/api/vaccinations?siteId=${site.id}`).expect(200)).body.items).to.have.length(1);
    expect((await crew.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', crew.csrf)).status).to.equal(403);
  });
});
