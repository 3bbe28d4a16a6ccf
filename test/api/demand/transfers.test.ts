// Planned transfers through the API: another site's spare vials earmarked for a short site, counted by both projections.
import { expect } from 'chai';
import { AuditEntry } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from '../../support/flock-fixtures.js';

describe('planned transfers', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  async function setUp() {
    const short = await createSite('SHORT');
    const lender = await createSite('LEND');
    const product = await createProduct();
    const presentation = await createPresentation(product, 10_000);
    const lot = await stockLot(await createSiteFridge(lender), presentation, 5, siteDay(lender, 200));
    await createVaccination(await createFlock(await createHouse(lender)), product, siteDay(lender, 15));
    await createVaccination(await createFlock(await createHouse(short), { birds: 20_000 }), product, siteDay(short, 20));
    const buyer = await signInAs(['purchasing']);
    return { short, lender, product, lot, buyer };
  }

  it('offers the other site’s spare vials to the short site, and a planned transfer moves them in both projections', async () => {
    const { short, lender, lot, buyer } = await setUp();
    const before = (await buyer.agent.get(`/api/demand/sites/${short.id}/projection`).expect(200)).body;
    // The lender keeps 2 of its 5 vials for its own 20,000 birds; 3 are spare, 2 cover the shortfall.
    expect(before.borrowing[0].candidates).to.deep.equal([
      { siteId: lender.id, siteName: lender.name, lotId: lot.id, lotNumber: lot.lotNumber, productId: before.borrowing[0].productId, dosesPerVial: 10_000, expiry: lot.expiry, spareVials: 3, suggestedVials: 2 },
    ]);
    const planned = await buyer.agent.post(`/api/demand/sites/${short.id}/transfers`).set('X-XSRF-TOKEN', buyer.csrf).send({ lotId: lot.id, fromSiteId: lender.id, vials: 2, plannedOn: siteDay(short, 5) });
    expect(planned.status, JSON.stringify(planned.body)).to.equal(201);
    expect(await AuditEntry.count({ where: { action: 'planned_transfer.create' } })).to.equal(1);
    const after = (await buyer.agent.get(`/api/demand/sites/${short.id}/projection`).expect(200)).body;
    expect(after.vaccinations[0]).to.deep.include({ shortfallDoses: 0 });
    expect(after.vaccinations[0].allocations[0]).to.include({ source: 'transfer', vials: 2 });
    const lenderView = (await buyer.agent.get(`/api/demand/sites/${lender.id}/projection`).expect(200)).body;
    expect(lenderView.products[0].dosesOnHand).to.equal(30_000);
    expect(lenderView.vaccinations[0].shortfallDoses).to.equal(0);
  });

  it('refuses more vials than the lending site holds beyond what is already promised, naming the vials', async () => {
    const { short, lender, lot, buyer } = await setUp();
    const send = (vials: number) => buyer.agent.post(`/api/demand/sites/${short.id}/transfers`).set('X-XSRF-TOKEN', buyer.csrf).send({ lotId: lot.id, fromSiteId: lender.id, vials, plannedOn: siteDay(short, 5) });
    expect((await send(4)).status).to.equal(201);
    const refused = await send(2);
    expect(refused.status).to.equal(409);
    expect(refused.body.error.fields).to.deep.equal([{ field: 'vials', message: 'At most 1 vials.' }]);
    const same = await buyer.agent.post(`/api/demand/sites/${short.id}/transfers`).set('X-XSRF-TOKEN', buyer.csrf).send({ lotId: lot.id, fromSiteId: short.id, vials: 1, plannedOn: siteDay(short, 5) });
    expect(same.body.error.fields[0].field).to.equal('fromSiteId');
  });

  it('is cancelled by purchasing and marked done by storage staff once moved', async () => {
    const { short, lender, lot, buyer } = await setUp();
    const plan = async () =>
      (await buyer.agent.post(`/api/demand/sites/${short.id}/transfers`).set('X-XSRF-TOKEN', buyer.csrf).send({ lotId: lot.id, fromSiteId: lender.id, vials: 1, plannedOn: siteDay(short, 5) })).body.id;
    const first = await plan();
    expect((await buyer.agent.post(`/api/demand/transfers/${first}/cancel`).set('X-XSRF-TOKEN', buyer.csrf)).body.status).to.equal('cancelled');
    const second = await plan();
    const storage = await signInAs(['storage']);
    expect((await storage.agent.post(`/api/demand/transfers/${second}/done`).set('X-XSRF-TOKEN', storage.csrf)).body.status).to.equal('done');
    expect((await storage.agent.post(`/api/demand/transfers/${second}/cancel`).set('X-XSRF-TOKEN', storage.csrf)).status).to.equal(403);
  });
});
