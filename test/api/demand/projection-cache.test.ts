// The projection's cache: a repeated request is served from memory with the same body, and every kind of write that
// feeds the projection (whichever service or connection makes it) changes the next body. Hand-computed expectations.
import { expect } from 'chai';
import { BirdCount, Hold, HoldDecision, Product, Site } from '../../../database/models/index.js';
import { clearProjectionCache, projectSites } from '../../../api/demand/projection-service.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createSupplier, createVaccination, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { createPurchaseOrder } from '../../support/receiving-fixtures.js';
import { countQueries } from '../../support/count-queries.js';

describe('the projection cache', () => {
  before(() => void testContext());
  beforeEach(async () => {
    await resetDatabase();
    clearProjectionCache();
  });

  async function setUp() {
    const site = await createSite('NORTH');
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Spray vaccine A' });
    const presentation = await createPresentation(product, 20_000, { unitPrice: 250 });
    const lot = await stockLot(fridge, presentation, 3, siteDay(site, 200));
    const flock = await createFlock(await createHouse(site), { birds: 20_000 });
    const vaccination = await createVaccination(flock, product, siteDay(site, 10));
    const buyer = await signInAs(['purchasing']);
    const projection = async () => (await buyer.agent.get(`/api/demand/sites/${site.id}/projection`).expect(200)).body;
    return { site, fridge, product, presentation, lot, flock, vaccination, buyer, projection };
  }

  it('serves a repeated request from memory with the same body as a cold computation', async () => {
    const { projection } = await setUp();
    const cold = await countQueries(projection);
    const hit = await countQueries(projection);
    expect(hit.result).to.deep.equal(cold.result);
    // A hit reads the session's user, the data version and the sites, nothing of the projection itself.
    expect(hit.queries, `cold ${cold.queries}, hit ${hit.queries}`).to.be.below(cold.queries / 3);
    clearProjectionCache();
    expect(await projection()).to.deep.equal(cold.result);
  });

  it('is shared by the purchasing overview and follows its writes too', async () => {
    const { site, product, presentation, buyer } = await setUp();
    const overview = async () => (await buyer.agent.get('/api/demand/overview').expect(200)).body;
    expect((await overview()).openOrders).to.have.length(0);
    await createPurchaseOrder((await Site.findByPk(site.id))!, { supplier: await createSupplier(5), product, presentation }, { expectedDate: siteDay(site, 5), packs: 1 });
    expect((await overview()).openOrders).to.have.length(1);
  });

  it('changes after every kind of write that feeds it', async () => {
    const { site, fridge, product, presentation, lot, flock, vaccination, buyer, projection } = await setUp();
    let body = await projection();
    expect(body.products[0]).to.include({ dosesOnHand: 60_000, dosesOnHold: 0 });

    // A movement: another lot received through the ledger (2 vials × 20,000 doses).
    await stockLot(fridge, presentation, 2, siteDay(site, 250));
    body = await projection();
    expect(body.products[0].dosesOnHand).to.equal(100_000);

    // A hold on the first lot, then the veterinarian's release.
    const hold = await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: null, reason: 'Arrived warm', openedBy: null });
    body = await projection();
    expect(body.products[0]).to.include({ dosesOnHand: 40_000, dosesOnHold: 60_000 });
    await HoldDecision.create({ holdId: hold.id, decision: 'release', signedBy: buyer.user.id, signerName: 'Test vet', signatureMeaning: 'released', supersedesId: null });
    body = await projection();
    expect(body.products[0]).to.include({ dosesOnHand: 100_000, dosesOnHold: 0 });

    // Vaccinations: one more planned, then one cancelled.
    const second = await createVaccination(flock, product, siteDay(site, 20));
    expect((await projection()).vaccinations).to.have.length(2);
    await second.update({ status: 'cancelled', cancelledAt: new Date(), cancelReason: 'test' });
    expect((await projection()).vaccinations).to.have.length(1);

    // Bird counts: 1,000 dead birds leave 19,000 to vaccinate.
    await BirdCount.create({ flockId: flock.id, countedOn: siteDay(site, -1), kind: 'mortality', birds: 1000, recordedBy: null });
    expect((await projection()).vaccinations[0]).to.include({ id: vaccination.id, birds: 19_000 });

    // A purchase order.
    await createPurchaseOrder((await Site.findByPk(site.id))!, { supplier: await createSupplier(5), product, presentation }, { expectedDate: siteDay(site, 5), packs: 1 });
    expect((await projection()).openOrders).to.have.length(1);

    // Stock settings through the API.
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 25_000 }).expect(200);
    expect((await projection()).settings[0]).to.include({ safetyStockValue: 25_000, saved: true });

    // Site settings: 10 % overage on 19,000 birds = 20,900 doses.
    await Site.update({ settings: { overagePercent: 10 } }, { where: { id: site.id } });
    expect((await projection()).vaccinations[0].dosesNeeded).to.equal(20_900);

    // The catalogue: a product renamed.
    await Product.update({ name: 'Spray vaccine B' }, { where: { id: product.id } });
    expect((await projection()).products[0].productName).to.equal('Spray vaccine B');
  });

  it('never serves yesterday’s body on a new day at the site', async () => {
    const { site, buyer } = await setUp();
    const user = { ...(await buyer.agent.get('/api/auth/session').expect(200)).body.user };
    const now = new Date();
    const [today] = await projectSites(user, [site.id], now);
    const [tomorrow] = await projectSites(user, [site.id], new Date(now.getTime() + 86_400_000));
    expect(today.today).to.equal(siteDay(site));
    expect(tomorrow.today).to.equal(siteDay(site, 1));
    expect(tomorrow.vaccinations[0].plannedDate).to.equal(today.vaccinations[0].plannedDate);
  });
});
