// The purchasing home across sites: shortfalls, orders to place, expiring stock and open orders, each most urgent first.
import { expect } from 'chai';
import { resetDatabase } from '../../support/test-database.js';
import { OVERVIEW_LIST_LIMIT } from '../../../shared/demand/purchasing-overview.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from '../../support/flock-fixtures.js';

describe('the purchasing overview', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('gathers every visible site’s shortfalls by date and orders to place by order-by date, naming the site', async () => {
    const north = await createSite('NORTH');
    const south = await createSite('SOUTH');
    const hidden = await createSite('HIDDEN');
    const product = await createProduct();
    await createPresentation(product, 20_000);
    await stockLot(await createSiteFridge(north), await createPresentation(product, 1000), 5, siteDay(north, 25));
    await createVaccination(await createFlock(await createHouse(north)), product, siteDay(north, 40));
    await createVaccination(await createFlock(await createHouse(south)), product, siteDay(south, 12));
    await createVaccination(await createFlock(await createHouse(hidden)), product, siteDay(hidden, 5));
    const buyer = await signInAs(['purchasing'], [north, south]);
    const body = (await buyer.agent.get('/api/demand/overview').expect(200)).body;
    expect(body.shortfalls.map((s: { siteName: string; plannedDate: string }) => [s.siteName, s.plannedDate])).to.deep.equal([
      [south.name, siteDay(south, 12)],
      [north.name, siteDay(north, 40)],
    ]);
    expect(body.ordersToPlace.map((s: { siteId: number }) => s.siteId)).to.deep.equal([south.id, north.id]);
    expect(body.expiring.map((e: { siteId: number; window: number }) => [e.siteId, e.window])).to.deep.equal([[north.id, 30]]);
    expect(body.expireUnused).to.have.length(1);
    expect(body.openOrders).to.deep.equal([]);
    expect(body.totals).to.deep.equal({ shortfalls: 2, ordersToPlace: 2, expiring: 1, expireUnused: 1, expiringLots: 1, belowSafety: 0, openOrders: 0 });
  });

  // Our own rule, hand-counted: a company of many sites has thousands of shortfalls; the home sends the most urgent few.
  it('sends the most urgent items of a long list and counts them all', async () => {
    const site = await createSite('LONG');
    const product = await createProduct();
    await createPresentation(product, 1000);
    const days = Array.from({ length: OVERVIEW_LIST_LIMIT + 3 }, (_, i) => 10 + ((i * 7) % (OVERVIEW_LIST_LIMIT + 3)));
    for (const day of days) await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, day));
    const buyer = await signInAs(['purchasing'], [site]);
    const body = (await buyer.agent.get('/api/demand/overview').expect(200)).body;
    expect(body.totals.shortfalls).to.equal(OVERVIEW_LIST_LIMIT + 3);
    expect(body.shortfalls).to.have.length(OVERVIEW_LIST_LIMIT);
    const sent = body.shortfalls.map((s: { plannedDate: string }) => s.plannedDate);
    const earliest = [...days].sort((a, b) => a - b).slice(0, OVERVIEW_LIST_LIMIT).map((day) => siteDay(site, day));
    expect(sent).to.deep.equal(earliest);
  });
});
