// A lot's exposure through the API: received into a fridge whose stored readings hold an excursion, judged by its product's range.
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { StockMovement } from '../../../database/models/index.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createLogger } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from '../../support/flock-fixtures.js';

const minute = 60_000;

async function storeReadings(loggerId: number, start: number, stepMinutes: number, temps: number[]): Promise<void> {
  const values = temps.map((t, i) => `(${loggerId}, to_timestamp(${(start + i * stepMinutes * minute) / 1000}), ${t})`).join(', ');
  await ownerConnection().query(`INSERT INTO readings (logger_id, at, temp_c) VALUES ${values}`, { type: QueryTypes.INSERT });
}

describe('lot exposure API', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('reports the hour above the product range that the lot sat through, and the transfer it made after (hand-computed)', async () => {
    const site = await createSite('EXP');
    const first = await createSiteFridge(site);
    const second = await createSiteFridge(site);
    const start = Date.UTC(2026, 10, 1, 8, 0);
    await storeReadings((await createLogger(first)).id, start, 30, [4, 4, 9, 9, 4, 4, 4, 4]);
    await storeReadings((await createLogger(second)).id, start, 30, [4, 4, 4, 4, 4, 4, 4, 4]);
    // The demo-like label of 35–45 °F: 9 °C (48.2 °F) is above it.
    const product = await createProduct();
    await product.update({ storageLow: 35, storageHigh: 45, storageUnit: 'F' });
    const lot = await stockLot(first, await createPresentation(product, 1000), 10, '2030-01-31');
    await ownerConnection().query(`UPDATE stock_movements SET at = to_timestamp(${start / 1000}) WHERE lot_id = ${lot.id}`);
    await StockMovement.create({
      lotId: lot.id, kind: 'transfer', vials: 10, fromFridgeId: first.id, toFridgeId: second.id,
      leftAt: new Date(start + 150 * minute), at: new Date(start + 165 * minute), sourceKind: 'test', sourceId: null, recordedBy: null,
    });

    const { agent } = await signInAs(['veterinarian']);
    const response = await agent.get(`/api/exposure/lots/${lot.id}`).expect(200);
    const body = response.body;
    expect(body.minutesAbove).to.equal(60);
    expect(body.excursions).to.have.length(1);
    expect(body.excursions[0]).to.include({ kind: 'high', start: start + 60 * minute, end: start + 120 * minute, peakC: 9 });
    expect(body.timeOut).to.have.length(1);
    expect(body.timeOut[0]).to.include({ reason: 'transfer', minutes: 15 });
    expect(body.limits).to.include({ low: 35, high: 45, unit: 'F' });
    expect(body.froze).to.equal(false);
  });

  it('a 3-hour primary outage filled by the 30-minute backup: no unknown minutes, the warm hour the backup saw counted in full (hand-computed)', async () => {
    const site = await createSite('EXB');
    const fridge = await createSiteFridge(site);
    const start = Date.UTC(2026, 10, 1, 8, 0);
    // Primary every 10 min 08:00–09:00 and 12:10–12:50; its gap is 09:10–12:10. The backup every 30 min from 08:10:
    // 09:10 … 11:40 fill the gap, 30 min each; 10:10 and 10:40 read 9 °C, above a 35–45 °F label, for 60 minutes.
    const primary = (await createLogger(fridge)).id;
    await storeReadings(primary, start, 10, Array(7).fill(4));
    await storeReadings(primary, start + 250 * minute, 10, Array(5).fill(4));
    await storeReadings((await createLogger(fridge, 'backup')).id, start + 10 * minute, 30, [4, 4, 4, 4, 9, 9, 4, 4, 4, 4]);
    const product = await createProduct();
    await product.update({ storageLow: 35, storageHigh: 45, storageUnit: 'F' });
    const lot = await stockLot(fridge, await createPresentation(product, 1000), 10, '2030-01-31');
    await ownerConnection().query(`UPDATE stock_movements SET at = to_timestamp(${start / 1000}) WHERE lot_id = ${lot.id}`);
    await StockMovement.create({
      lotId: lot.id, kind: 'issue', vials: 10, fromFridgeId: fridge.id, toFridgeId: null,
      leftAt: null, at: new Date(start + 300 * minute), sourceKind: 'test', sourceId: null, recordedBy: null,
    });

    const { agent } = await signInAs(['veterinarian']);
    const body = (await agent.get(`/api/exposure/lots/${lot.id}`).expect(200)).body;
    expect(body.storageMinutes).to.equal(300);
    expect(body.minutesUnknown).to.equal(0);
    expect(body.unknown).to.deep.equal([]);
    expect(body.minutesAbove).to.equal(60);
    expect(body.excursions).to.have.length(1);
    expect(body.excursions[0]).to.include({ kind: 'high', start: start + 130 * minute, end: start + 190 * minute, minutes: 60, peakC: 9 });
  });

  it('is a 404 for an unknown lot', async () => {
    const { agent } = await signInAs(['storage']);
    expect((await agent.get('/api/exposure/lots/4242')).status).to.equal(404);
  });
});
