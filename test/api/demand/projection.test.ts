// The projection through the API: stock from the ledger, holds, month-end expiry, current birds, open orders, alerts and suggestions.
import { expect } from 'chai';
import { BirdCount, Hold, Site } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import {
  createFlock,
  createHouse,
  createPresentation,
  createProduct,
  createSiteFridge,
  createSupplier,
  createVaccination,
  siteDay,
  stockLot,
} from '../../support/flock-fixtures.js';
import { createPurchaseOrder } from '../../support/receiving-fixtures.js';

describe('the site projection', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  async function setUp() {
    const site = await createSite('NORTH');
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Spray vaccine A' });
    const presentation = await createPresentation(product, 20_000, { unitPrice: 250 });
    const buyer = await signInAs(['purchasing']);
    const projection = async () => (await buyer.agent.get(`/api/demand/sites/${site.id}/projection`).expect(200)).body;
    return { site, fridge, product, presentation, buyer, projection };
  }

  it('plans one 20,000-dose vial for a house of 20,000 birds from the lot in the fridge (common practice)', async () => {
    const { site, fridge, product, presentation, projection } = await setUp();
    const lot = await stockLot(fridge, presentation, 3, siteDay(site, 200));
    const flock = await createFlock(await createHouse(site), { birds: 20_000 });
    await createVaccination(flock, product, siteDay(site, 10));
    const body = await projection();
    expect(body.vaccinations[0]).to.deep.include({ dosesNeeded: 20_000, dosesAllocated: 20_000, shortfallDoses: 0 });
    expect(body.vaccinations[0].allocations).to.deep.equal([{ lot: lot.id, label: lot.lotNumber, source: 'stock', vials: 1, doses: 20_000 }]);
    expect(body.products[0]).to.deep.include({ productName: 'Spray vaccine A', dosesOnHand: 60_000, dosesNeeded: 20_000 });
    expect(body).to.include({ horizonDays: 180, today: siteDay(site) });
  });

  it('plans with the current birds after mortality, plus the site’s overage', async () => {
    const { site, fridge, product, presentation, projection } = await setUp();
    await Site.update({ settings: { overagePercent: 5 } }, { where: { id: site.id } });
    await stockLot(fridge, presentation, 3, siteDay(site, 200));
    const flock = await createFlock(await createHouse(site), { birds: 20_000 });
    await BirdCount.create({ flockId: flock.id, countedOn: siteDay(site, -3), kind: 'mortality', birds: 1000, recordedBy: null });
    await createVaccination(flock, product, siteDay(site, 10));
    // 19,000 birds × 1.05 = 19,950 doses (hand-computed).
    expect((await projection()).vaccinations[0]).to.deep.include({ birds: 19_000, dosesNeeded: 19_950 });
  });

  it('uses a month/year lot through its month’s last day and not the day after (PHAC 2007 §8.2)', async () => {
    const { site, fridge, product, presentation, projection } = await setUp();
    // A label reading month/year is stored by receiving as that month's last day.
    const monthEnd = siteDay(site, 40).slice(0, 7);
    const lastDay = new Date(Date.UTC(Number(monthEnd.slice(0, 4)), Number(monthEnd.slice(5, 7)), 0)).toISOString().slice(0, 10);
    await stockLot(fridge, presentation, 1, lastDay, { expiryDayGiven: false });
    const house = await createHouse(site);
    const flock = await createFlock(house);
    const onLastDay = await createVaccination(flock, product, lastDay);
    const body = await projection();
    expect(body.vaccinations.find((v: { id: number }) => v.id === onLastDay.id).shortfallDoses).to.equal(0);
    await onLastDay.update({ status: 'cancelled', cancelledAt: new Date(), cancelReason: 'test' });
    const dayAfter = new Date(Date.parse(`${lastDay}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    await createVaccination(flock, product, dayAfter);
    expect((await projection()).vaccinations[0].shortfallDoses).to.equal(20_000);
  });

  it('never plans with a lot on hold', async () => {
    const { site, fridge, product, presentation, projection } = await setUp();
    const lot = await stockLot(fridge, presentation, 5, siteDay(site, 200));
    await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: null, reason: 'Arrived warm', openedBy: null });
    await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, 10));
    const body = await projection();
    expect(body.vaccinations[0].shortfallDoses).to.equal(20_000);
    expect(body.products[0]).to.deep.include({ dosesOnHand: 0, dosesOnHold: 100_000 });
    expect(body.alerts.expiring).to.deep.equal([]);
  });

  it('alerts the uncovered vaccination and suggests an order by first shortfall − supplier lead time − margin, in whole packs', async () => {
    const { site, fridge, product, presentation, buyer, projection } = await setUp();
    const supplier = await createSupplier(14);
    await buyer.agent
      .put(`/api/demand/sites/${site.id}/products/${product.id}/settings`)
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: supplier.id })
      .expect(200);
    await stockLot(fridge, presentation, 1, siteDay(site, 200));
    const house = await createHouse(site, 'House 2');
    const flock = await createFlock(house, { name: 'H2-A' });
    await createVaccination(flock, product, siteDay(site, 20));
    await createVaccination(flock, product, siteDay(site, 50));
    const body = await projection();
    expect(body.alerts.uncovered).to.deep.equal([
      { vaccinationId: body.vaccinations[1].id, plannedDate: siteDay(site, 50), flockId: flock.id, flockName: 'H2-A', houseName: 'House 2', productId: product.id, productName: 'Spray vaccine A', shortfallDoses: 20_000 },
    ]);
    // 50 − 14 days lead time − 3 days margin (site default) = 33 days from today.
    expect(body.suggestions[0]).to.deep.include({ orderBy: siteDay(site, 33), needDate: siteDay(site, 50), packs: 1, vials: 10, supplierId: supplier.id, leadTimeDays: 14, urgent: false, value: 2500 });
  });

  it('counts an open purchase order from its expected date, so a covered shortfall needs no suggestion', async () => {
    const { site, product, presentation, projection } = await setUp();
    await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, 30));
    expect((await projection()).suggestions).to.have.length(1);
    const supplier = await createSupplier(5);
    await createPurchaseOrder((await Site.findByPk(site.id))!, { supplier, product, presentation }, { expectedDate: siteDay(site, 10), packs: 1 });
    const body = await projection();
    expect(body.suggestions).to.deep.equal([]);
    expect(body.vaccinations[0].allocations[0]).to.include({ source: 'order', vials: 1 });
    expect(body.openOrders).to.have.length(1);
    expect(body.openOrders[0].lastSent).to.equal(null);
  });

  it('lists lots expiring within 30/60/90 days and those that will expire before their planned use, with the value lost', async () => {
    const { site, fridge, product, presentation, projection } = await setUp();
    const soon = await stockLot(fridge, presentation, 2, siteDay(site, 20));
    const later = await stockLot(fridge, presentation, 1, siteDay(site, 75));
    await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, 40));
    const body = await projection();
    expect(body.alerts.expiring.map((a: { lotId: number; window: number; daysLeft: number }) => [a.lotId, a.window, a.daysLeft])).to.deep.equal([
      [soon.id, 30, 20],
      [later.id, 90, 75],
    ]);
    expect(body.alerts.expireUnused).to.deep.equal([
      { lotId: soon.id, lotNumber: soon.lotNumber, productId: product.id, productName: 'Spray vaccine A', presentationId: presentation.id, expiry: siteDay(site, 20), vials: 2, doses: 40_000, valueLost: 500, neededAfterExpiry: true },
    ]);
  });

  it('alerts stock below the safety stock after the planned vaccinations, with days of cover turned into doses', async () => {
    const { site, fridge, product, presentation, buyer, projection } = await setUp();
    await stockLot(fridge, presentation, 2, siteDay(site, 300));
    await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, 10));
    // 20,000 doses planned in 180 days; 90 days of cover = 10,000 doses; 20,000 left is enough.
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'days', safetyStockValue: 90 }).expect(200);
    expect((await projection()).alerts.belowSafety).to.deep.equal([]);
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 25_000 }).expect(200);
    const body = await projection();
    expect(body.alerts.belowSafety).to.deep.equal([{ productId: product.id, productName: 'Spray vaccine A', from: siteDay(site, 10), lowestDoses: 20_000, safetyStockDoses: 25_000 }]);
    expect(body.suggestions[0]).to.deep.include({ topUpDoses: 5000, packs: 1 });
  });

  it('refuses bad stock settings, naming the field', async () => {
    const { site, product, buyer } = await setUp();
    const other = await createPresentation(await createProduct(), 1000);
    const put = (body: object) => buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    expect((await put({ safetyStockKind: 'weeks', safetyStockValue: 1 })).body.error.fields[0].field).to.equal('safetyStockKind');
    expect((await put({ safetyStockKind: 'days', safetyStockValue: 400 })).body.error.fields[0].field).to.equal('safetyStockValue');
    const wrongPack = await put({ safetyStockKind: 'doses', safetyStockValue: 0, presentationId: other.id });
    expect(wrongPack.status).to.equal(400);
    expect(wrongPack.body.error.fields[0].field).to.equal('presentationId');
    expect((await put({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: 999 })).body.error.fields[0].field).to.equal('supplierId');
  });

  it('answers 404 for another site’s projection to a user limited to one site', async () => {
    const mine = await createSite('MINE');
    const theirs = await createSite('THEIRS');
    const vet = await signInAs(['veterinarian'], [mine]);
    expect((await vet.agent.get(`/api/demand/sites/${theirs.id}/projection`)).status).to.equal(404);
    expect((await vet.agent.get(`/api/demand/sites/${mine.id}/projection`)).status).to.equal(200);
  });
});
