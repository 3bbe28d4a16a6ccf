// The lots list derives each lot's status in SQL: it must agree with the shared derivation (lot-statuses.ts, used by the
// lot page) for every state, order lot numbers by their digits, and count a page past the end. Hand-computed cases.
import { expect } from 'chai';
import { Hold, HoldDecision, type Fridge, type Site } from '../../../database/models/index.js';
import { listLots } from '../../../api/lots/lot-list.js';
import { lotStatuses } from '../../../api/lots/lot-statuses.js';
import { postMovement } from '../../../api/lots/stock-ledger.js';
import { lotListQuerySchema } from '../../../shared/lots/lot-list.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, createTestUser, testContext } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../../support/flock-fixtures.js';

describe('the lots list query', () => {
  let site: Site;
  let fridge: Fridge;
  before(() => testContext());
  beforeEach(async () => {
    await resetDatabase();
    site = await createSite('NORTH', 'Pacific/Auckland');
    fridge = await createFridge(site);
  });

  const user = { id: 1, allSites: true, siteIds: [], roles: ['admin'] } as unknown as Express.User;
  const query = (q: Record<string, unknown> = {}) => lotListQuerySchema.parse({ pageSize: 100, ...q });

  it('gives every lot the status the shared derivation gives it', async () => {
    const presentation = await createPresentation(await createProduct(), 1000);
    const usable = await stockLot(fridge, presentation, 4, siteDay(site, 30), { lotNumber: 'U-1' });
    const expired = await stockLot(fridge, presentation, 2, siteDay(site, -1), { lotNumber: 'E-1' });
    // Expires today on the site's calendar: still usable through its last day.
    const lastDay = await stockLot(fridge, presentation, 2, siteDay(site), { lotNumber: 'T-1' });
    const held = await stockLot(fridge, presentation, 3, siteDay(site, 60), { lotNumber: 'H-1' });
    const released = await stockLot(fridge, presentation, 3, siteDay(site, 60), { lotNumber: 'R-1' });
    const reversed = await stockLot(fridge, presentation, 3, siteDay(site, 60), { lotNumber: 'V-1' });
    const discarded = await stockLot(fridge, presentation, 1, siteDay(site, 60), { lotNumber: 'D-1' });
    const usedUp = await stockLot(fridge, presentation, 1, siteDay(site, 60), { lotNumber: 'X-1' });
    const signer = await createTestUser({ roles: ['veterinarian'] });
    await Hold.create({ lotId: held.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'warm box', openedBy: null });
    await Hold.create({ lotId: held.id, cause: 'excursion', sourceKind: 'test', sourceId: 2, reason: 'fridge warm', openedBy: null });
    const releasedHold = await Hold.create({ lotId: released.id, cause: 'arrival', sourceKind: 'test', sourceId: 3, reason: 'warm box', openedBy: null });
    await HoldDecision.create({ holdId: releasedHold.id, decision: 'release', signedBy: signer.id, signerName: signer.name, signatureMeaning: 'test', supersedesId: null });
    // A release later superseded by a discard decision: the hold stands again.
    const reversedHold = await Hold.create({ lotId: reversed.id, cause: 'arrival', sourceKind: 'test', sourceId: 4, reason: 'warm box', openedBy: null });
    const first = await HoldDecision.create({ holdId: reversedHold.id, decision: 'release', signedBy: signer.id, signerName: signer.name, signatureMeaning: 'test', supersedesId: null });
    await HoldDecision.create({ holdId: reversedHold.id, decision: 'discard', signedBy: signer.id, signerName: signer.name, signatureMeaning: 'test', supersedesId: first.id });
    await testContext().sequelize.transaction(async (transaction) => {
      await postMovement({ lotId: discarded.id, kind: 'discard', vials: 1, fromFridgeId: fridge.id, at: new Date(), sourceKind: 'test', sourceId: null, reason: 'damaged', recordedBy: null }, transaction);
      await postMovement({ lotId: usedUp.id, kind: 'adjust', vials: 1, fromFridgeId: fridge.id, at: new Date(), sourceKind: 'test', sourceId: null, reason: 'counted none', recordedBy: null }, transaction);
    });

    const page = await listLots(testContext().sequelize, user, query());
    const shared = await lotStatuses(page.items.map((item) => item.id));
    const byNumber = Object.fromEntries(page.items.map((item) => [item.lotNumber, [item.status, item.holdCauses]]));
    expect(byNumber).to.deep.equal({
      'U-1': ['usable', []],
      'E-1': ['expired', []],
      'T-1': ['usable', []],
      'H-1': ['on_hold', ['arrival', 'excursion']],
      'R-1': ['usable', []],
      'V-1': ['on_hold', ['arrival']],
      'D-1': ['discarded', []],
      'X-1': ['used_up', []],
    });
    for (const item of page.items) expect(item.status, item.lotNumber).to.equal(shared.get(item.id)!.status);
    expect([usable, expired, lastDay].every((lot) => page.items.some((item) => item.id === lot.id))).to.equal(true);
  });

  it('orders lot numbers by their digits, filters on the derived status, and counts a page past the end', async () => {
    const presentation = await createPresentation(await createProduct(), 1000);
    for (const lotNumber of ['PX-10', 'PX-9', 'PX-100']) await stockLot(fridge, presentation, 1, siteDay(site, 30), { lotNumber });
    const sorted = await listLots(testContext().sequelize, user, query({ sort: 'lotNumber' }));
    expect(sorted.items.map((item) => item.lotNumber)).to.deep.equal(['PX-9', 'PX-10', 'PX-100']);
    const descending = await listLots(testContext().sequelize, user, query({ sort: '-lotNumber', pageSize: 2 }));
    expect(descending.items.map((item) => item.lotNumber)).to.deep.equal(['PX-100', 'PX-10']);
    expect(descending.total).to.equal(3);
    const beyond = await listLots(testContext().sequelize, user, query({ page: 5, pageSize: 2 }));
    expect(beyond).to.deep.include({ items: [], total: 3, page: 5 });
    expect((await listLots(testContext().sequelize, user, query({ status: 'expired' }))).total).to.equal(0);
  });
});
