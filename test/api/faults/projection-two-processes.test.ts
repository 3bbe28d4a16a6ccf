// Two API processes each keep the projection in memory: a write through either (or straight to the database) shows in the
// next body from both, never a stale one. Hand-computed expectations.
import { expect } from 'chai';
import request from 'supertest';
import { Hold } from '../../../database/models/index.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { signInRemote, type RemoteSession } from '../../support/remote-session.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';
import { createSite, createTestUser, testContext } from '../../support/test-app.js';
import { resetDatabase } from '../../support/test-database.js';

describe('the projection cache across two API processes', function () {
  this.timeout(90_000);
  let first: ServerProcess;
  let second: ServerProcess;

  before(async () => {
    testContext();
    await resetDatabase();
    const ports = [await freePort(), await freePort()];
    [first, second] = await Promise.all(ports.map((port) => startServerProcess(port)));
  });
  after(async () => {
    await Promise.all([first?.stop(), second?.stop()]);
  });

  it('serves the body after the last write from both processes, whichever made it', async () => {
    const site = await createSite('NORTH');
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Spray vaccine A' });
    const presentation = await createPresentation(product, 20_000);
    const lot = await stockLot(fridge, presentation, 3, siteDay(site, 200));
    await createVaccination(await createFlock(await createHouse(site), { birds: 20_000 }), product, siteDay(site, 10));
    const buyer = await createTestUser({ roles: ['purchasing'] });
    const sessions: [ServerProcess, RemoteSession][] = [
      [first, await signInRemote(first.url, buyer.email)],
      [second, await signInRemote(second.url, buyer.email)],
    ];
    const projections = () =>
      Promise.all(sessions.map(async ([server, session]) => (await request(server.url).get(`/api/demand/sites/${site.id}/projection`).set('Cookie', session.cookie).expect(200)).body));

    // Twice each: the second body of each process comes from its memory.
    for (let i = 0; i < 2; i++) for (const body of await projections()) expect(body.products[0]).to.include({ dosesOnHand: 60_000, dosesOnHold: 0 });

    // Through the first process: both see the new safety stock.
    const [server, session] = sessions[0];
    await request(server.url).put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('Cookie', session.cookie).set('X-XSRF-TOKEN', session.csrf)
      .send({ safetyStockKind: 'doses', safetyStockValue: 25_000 }).expect(200);
    for (const body of await projections()) expect(body.settings[0]).to.include({ safetyStockValue: 25_000, saved: true });

    // Straight to the database from a third connection (another service): both see the hold.
    await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: null, reason: 'Arrived warm', openedBy: null });
    for (const body of await projections()) expect(body.products[0]).to.include({ dosesOnHand: 0, dosesOnHold: 60_000 });
  });
});
