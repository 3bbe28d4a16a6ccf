// The safety-stock proposal through the API: weekly use read from the ledger's issues and returns, the textbook rule, its refusals.
import { expect } from 'chai';
import { StockMovement } from '../../../database/models/index.js';
import { zForServiceLevel } from '../../../shared/inventory/service-level-z.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createPresentation, createProduct, createSiteFridge, createSupplier, stockLot } from '../../support/flock-fixtures.js';

describe('the safety-stock proposal', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  async function withHistory(weeklyVials: number[]) {
    const site = await createSite('NORTH', 'UTC');
    const fridge = await createSiteFridge(site);
    const product = await createProduct();
    const presentation = await createPresentation(product, 1000);
    const lot = await stockLot(fridge, presentation, 1000, '2030-12-31');
    // One issue a week, three days into each of the last full weeks (oldest first).
    for (const [i, vials] of weeklyVials.entries()) {
      if (vials === 0) continue;
      const at = new Date(Date.now() - ((weeklyVials.length - i) * 7 - 3) * 86_400_000);
      await StockMovement.create({ lotId: lot.id, kind: 'issue', vials, fromFridgeId: fridge.id, toFridgeId: null, leftAt: null, at, sourceKind: 'test', sourceId: null, recordedBy: null });
    }
    const buyer = await signInAs(['purchasing']);
    return { site, product, fridge, lot, buyer };
  }

  it('proposes z·σd·√LT from weekly use at the chosen service level, with the supplier’s lead time (Stevenson: ROP = d̄·LT + z·σd·√LT)', async () => {
    // Weekly use 55, 45, 55, 45, 50 thousand doses: mean 50,000, sample σ 5,000; a 28-day lead time is 4 weeks.
    const { site, product, buyer } = await withHistory([55, 45, 55, 45, 50]);
    const supplier = await createSupplier(28);
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: supplier.id }).expect(200);
    const response = await buyer.agent.post(`/api/demand/sites/${site.id}/products/${product.id}/safety-stock-proposal`).set('X-XSRF-TOKEN', buyer.csrf).send({ serviceLevel: 0.95 });
    expect(response.status, JSON.stringify(response.body)).to.equal(200);
    expect(response.body).to.include({ weeks: 5, meanWeeklyDoses: 50_000, leadTimeDays: 28, serviceLevel: 0.95 });
    const expected = zForServiceLevel(0.95) * 5000 * 2;
    expect(response.body.safetyStock).to.be.closeTo(expected, 1e-6);
    expect(response.body.safetyStockDoses).to.equal(Math.ceil(expected));
    expect(response.body.reorderPoint).to.be.closeTo(200_000 + expected, 1e-6);
  });

  it('counts returns against issues', async () => {
    const { site, product, fridge, lot, buyer } = await withHistory([10, 10, 10, 10]);
    await StockMovement.create({ lotId: lot.id, kind: 'return', vials: 4, fromFridgeId: null, toFridgeId: fridge.id, leftAt: null, at: new Date(Date.now() - 2 * 86_400_000), sourceKind: 'test', sourceId: null, recordedBy: null });
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: (await createSupplier(7)).id }).expect(200);
    const response = await buyer.agent.post(`/api/demand/sites/${site.id}/products/${product.id}/safety-stock-proposal`).set('X-XSRF-TOKEN', buyer.csrf).send({ serviceLevel: 0.9 });
    expect(response.body.meanWeeklyDoses).to.equal((10_000 * 3 + 6000) / 4);
  });

  it('refuses without enough history (422), without a supplier (422 on supplierId), and an impossible service level (400)', async () => {
    const { site, product, buyer } = await withHistory([10, 10]);
    const ask = (body: object) => buyer.agent.post(`/api/demand/sites/${site.id}/products/${product.id}/safety-stock-proposal`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    const noSupplier = await ask({ serviceLevel: 0.95 });
    expect(noSupplier.status).to.equal(422);
    expect(noSupplier.body.error.fields[0].field).to.equal('supplierId');
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: (await createSupplier(7)).id }).expect(200);
    const short = await ask({ serviceLevel: 0.95 });
    expect(short.status).to.equal(422);
    expect(short.body.error.message).to.match(/2 of 4 weeks/);
    expect((await ask({ serviceLevel: 1 })).body.error.fields[0].field).to.equal('serviceLevel');
  });
});
