// The lots list and the lot page through the API: filters, the sort whitelist, paging, site limits, the page's content.
import { expect } from 'chai';
import { Hold, HoldDecision, PlannedTransfer, StockMovement, type Fridge, type Lot, type Product, type Site } from '../../../database/models/index.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext, type SignedIn } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';
import { createFlock, createHouse, createPresentation, createProduct, createVaccination, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { postMovement } from '../../../api/lots/stock-ledger.js';

describe('lots list and lot page', () => {
  let north: Site;
  let south: Site;
  let northFridge: Fridge;
  let secondNorthFridge: Fridge;
  let southFridge: Fridge;
  let soon: Lot;
  let later: Lot;
  let held: Lot;
  let southOnly: Lot;
  let storage: SignedIn & { user: { id: number; name: string } };
  let pox: Product;

  before(() => testContext());

  beforeEach(async () => {
    await resetDatabase();
    north = await createSite('NORTH');
    // Another zone than the north's, so each side's clock is told apart.
    south = await createSite('SOUTH', 'America/Denver');
    northFridge = await createFridge(north);
    secondNorthFridge = await createFridge(north);
    southFridge = await createFridge(south);
    const bronchitis = await createProduct({ name: 'Alpha live spray' });
    pox = await createProduct({ name: 'Beta wing-web' });
    later = await stockLot(northFridge, await createPresentation(bronchitis, 1000), 30, siteDay(north, 400), { lotNumber: 'AB-200' });
    soon = await stockLot(secondNorthFridge, await createPresentation(pox, 500), 8, siteDay(north, 20), { lotNumber: 'PX-101' });
    held = await stockLot(northFridge, await createPresentation(pox, 1000), 5, siteDay(north, 100), { lotNumber: 'PX-300' });
    await Hold.create({ lotId: held.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'warm box', openedBy: null });
    southOnly = await stockLot(southFridge, await createPresentation(bronchitis, 1000), 12, siteDay(south, 50), { lotNumber: 'AB-900' });
    storage = await signInAs(['storage'], [north]);
  });

  const list = (query: Record<string, string | number> = {}, who = storage) => who.agent.get('/api/lots').query(query);
  const numbers = (body: { items: { lotNumber: string }[] }) => body.items.map((i) => i.lotNumber);

  it('lists only lots on the user\'s sites, earliest expiry first, with status words and hold causes', async () => {
    const response = await list();
    expect(response.status).to.equal(200);
    expect(numbers(response.body)).to.deep.equal(['PX-101', 'PX-300', 'AB-200']);
    expect(response.body.total).to.equal(3);
    const heldRow = response.body.items.find((i: { lotNumber: string }) => i.lotNumber === 'PX-300');
    expect(heldRow).to.include({ status: 'on_hold', vials: 5 });
    expect(heldRow.holdCauses).to.deep.equal(['arrival']);
    // An admin of every site sees the south lot too.
    expect((await list({}, await signInAs(['admin']))).body.total).to.equal(4);
  });

  it('a lot moved to another site belongs to both sites', async () => {
    await testContext().sequelize.transaction((transaction) =>
      postMovement({ lotId: southOnly.id, kind: 'transfer', vials: 2, fromFridgeId: southFridge.id, toFridgeId: northFridge.id, leftAt: new Date(Date.now() - 60_000), at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null }, transaction),
    );
    const row = (await list({ q: 'ab-9' })).body.items[0];
    expect(row).to.include({ lotNumber: 'AB-900', vials: 2 });
    // The north user sees the site they may see; an admin sees both.
    expect(row.sites.map((s: { id: number }) => s.id)).to.deep.equal([north.id]);
    const everywhere = (await list({ q: 'ab-9' }, await signInAs(['admin']))).body.items[0];
    expect(everywhere.sites.map((s: { id: number }) => s.id)).to.deep.equal([north.id, south.id]);
    expect((await storage.agent.get(`/api/lots/${southOnly.id}`)).status).to.equal(200);
  });

  it('searches by lot number (any case, wildcards taken literally) and filters by product, fridge, site, status and expiry', async () => {
    expect(numbers((await list({ q: 'px' })).body)).to.deep.equal(['PX-101', 'PX-300']);
    expect(numbers((await list({ q: '%' })).body)).to.deep.equal([]);
    expect(numbers((await list({ productId: (await later.reload({ include: ['presentation'] })).presentation!.productId })).body)).to.deep.equal(['AB-200']);
    expect(numbers((await list({ fridgeId: northFridge.id })).body)).to.deep.equal(['PX-300', 'AB-200']);
    expect(numbers((await list({ siteId: north.id })).body)).to.have.length(3);
    expect(numbers((await list({ status: 'on_hold' })).body)).to.deep.equal(['PX-300']);
    expect(numbers((await list({ status: 'usable' })).body)).to.deep.equal(['PX-101', 'AB-200']);
    expect(numbers((await list({ expiryFrom: siteDay(north, 50), expiryTo: siteDay(north, 500) })).body)).to.deep.equal(['PX-300', 'AB-200']);
  });

  it('shows expired, discarded and used-up lots by status', async () => {
    const old = await stockLot(northFridge, await createPresentation(await createProduct(), 100), 3, siteDay(north, -1), { lotNumber: 'OLD-1' });
    await testContext().sequelize.transaction(async (transaction) => {
      await postMovement({ lotId: soon.id, kind: 'discard', vials: 8, fromFridgeId: secondNorthFridge.id, at: new Date(), sourceKind: 'test', sourceId: null, reason: 'damaged', recordedBy: null }, transaction);
      await postMovement({ lotId: later.id, kind: 'adjust', vials: 30, fromFridgeId: northFridge.id, at: new Date(), sourceKind: 'test', sourceId: null, reason: 'counted none', recordedBy: null }, transaction);
    });
    expect(numbers((await list({ status: 'expired' })).body)).to.deep.equal([old.lotNumber]);
    expect(numbers((await list({ status: 'discarded' })).body)).to.deep.equal(['PX-101']);
    expect(numbers((await list({ status: 'used_up' })).body)).to.deep.equal(['AB-200']);
  });

  it('sorts by a whitelisted key only; an unknown sort or a bad filter is a 400 naming it', async () => {
    expect(numbers((await list({ sort: '-expiry' })).body)).to.deep.equal(['AB-200', 'PX-300', 'PX-101']);
    expect(numbers((await list({ sort: '-vials' })).body)).to.deep.equal(['AB-200', 'PX-101', 'PX-300']);
    expect(numbers((await list({ sort: 'product' })).body)).to.deep.equal(['AB-200', 'PX-101', 'PX-300']);
    for (const [query, field] of [[{ sort: 'expiry; DROP TABLE lots' }, 'sort'], [{ sort: 'id' }, 'sort'], [{ status: 'lost' }, 'status'], [{ expiryFrom: '2027-13' }, 'expiryFrom'], [{ expiryFrom: '2027-05-01', expiryTo: '2027-04-01' }, 'expiryTo'], [{ pageSize: 500 }, 'pageSize']] as const) {
      const response = await list(query as Record<string, string | number>);
      expect(response.status, JSON.stringify(query)).to.equal(400);
      expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal([field]);
    }
  });

  it('pages the list: 3 lots, 2 a page → pages of 2 and 1 (hand-computed)', async () => {
    const first = (await list({ pageSize: 2, page: 1 })).body;
    const second = (await list({ pageSize: 2, page: 2 })).body;
    expect([first.total, numbers(first), numbers(second)]).to.deep.equal([3, ['PX-101', 'PX-300'], ['AB-200']]);
  });

  it('the filter options hold the user\'s sites, fridges and products only', async () => {
    const options = (await storage.agent.get('/api/lots/filters').expect(200)).body;
    expect(options.sites.map((s: { id: number }) => s.id)).to.deep.equal([north.id]);
    expect(options.fridges.map((f: { id: number }) => f.id).sort()).to.deep.equal([northFridge.id, secondNorthFridge.id].sort());
    // Each with its site's zone: a transfer's arrival is typed on the receiving fridge's site's clock.
    expect(options.fridges.map((f: { timeZone: string }) => f.timeZone)).to.deep.equal([north.timeZone, north.timeZone]);
    expect(options.products.map((p: { name: string }) => p.name)).to.deep.equal(['Alpha live spray', 'Beta wing-web']);
  });

  it('a user of another site gets 404 on the lot page; crew may not read lots', async () => {
    expect((await storage.agent.get(`/api/lots/${southOnly.id}`)).status).to.equal(404);
    expect((await list({}, await signInAs(['crew'], [north]))).status).to.equal(403);
  });

  it('the lot page shows product, status with holds and decisions, locations, history, exposure and the flocks that received it', async () => {
    const vet = await signInAs(['veterinarian'], [north]);
    const hold = (await Hold.findOne({ where: { lotId: held.id } }))!;
    await HoldDecision.create({ holdId: hold.id, decision: 'release_with_condition', condition: 'Use first', notes: '', signedBy: vet.user.id, signerName: vet.user.name, signatureMeaning: 'test', supersedesId: null });
    const flock = await createFlock(await createHouse(north, 'House 7'), { name: 'Spring pullets' });
    const vaccination = await createVaccination(flock, pox, siteDay(north, 0));
    // The receipt an hour ago, so the later movements follow it.
    await ownerConnection().query(`UPDATE stock_movements SET at = now() - interval '1 hour' WHERE lot_id = ${held.id}`);
    await testContext().sequelize.transaction(async (transaction) => {
      await postMovement({ lotId: held.id, kind: 'transfer', vials: 2, fromFridgeId: northFridge.id, toFridgeId: secondNorthFridge.id, leftAt: new Date(Date.now() - 120_000), at: new Date(Date.now() - 60_000), sourceKind: 'user', sourceId: null, recordedBy: storage.user.id }, transaction);
      await postMovement({ lotId: held.id, kind: 'issue', vials: 2, fromFridgeId: northFridge.id, leftAt: new Date(Date.now() - 50_000), at: new Date(Date.now() - 50_000), sourceKind: 'vaccination', sourceId: vaccination.id, recordedBy: storage.user.id }, transaction);
      await postMovement({ lotId: held.id, kind: 'return', vials: 1, toFridgeId: northFridge.id, at: new Date(Date.now() - 10_000), sourceKind: 'vaccination', sourceId: vaccination.id, recordedBy: storage.user.id }, transaction);
    });
    const page = (await storage.agent.get(`/api/lots/${held.id}`).expect(200)).body;
    expect(page).to.include({ lotNumber: 'PX-300', status: 'usable', vialsOnHand: 4 });
    expect(page.product).to.include({ name: 'Beta wing-web', storageUnit: 'F' });
    expect(page.presentation.dosesPerVial).to.equal(1000);
    expect(page.holds).to.have.length(1);
    expect(page.holds[0]).to.include({ cause: 'arrival', standing: false });
    expect(page.holds[0].decisions[0]).to.include({ decision: 'release_with_condition', condition: 'Use first', current: true });
    // 5 − 2 moved − 2 issued + 1 returned = 2 in the first fridge, 2 in the second (hand-computed).
    expect(page.locations.map((l: { fridgeId: number; vials: number }) => [l.fridgeId, l.vials]).sort()).to.deep.equal([[northFridge.id, 2], [secondNorthFridge.id, 2]].sort());
    expect(page.history.map((m: { kind: string }) => m.kind)).to.deep.equal(['return', 'issue', 'transfer', 'receive']);
    expect(page.history[2].recordedBy).to.equal(storage.user.name);
    expect(page.flocks).to.deep.equal([{ vaccinationId: vaccination.id, plannedDate: vaccination.plannedDate, status: 'planned', flockId: flock.id, flockName: 'Spring pullets', houseName: 'House 7', siteName: north.name, vialsIssued: 2, vialsReturned: 1 }]);
    expect(page.exposure).to.be.an('object');
    // 60 s out during the transfer (hand-computed).
    expect(page.exposure.timeOut.find((t: { reason: string }) => t.reason === 'transfer').minutes).to.equal(1);
    expect(await StockMovement.count({ where: { lotId: held.id } })).to.equal(4);
  });

  it('another site\'s fridges on the history and locations show only "Another site"', async () => {
    const both = await signInAs(['storage'], [north, south]);
    await testContext().sequelize.transaction((transaction) =>
      postMovement({ lotId: later.id, kind: 'transfer', vials: 10, fromFridgeId: northFridge.id, toFridgeId: southFridge.id, leftAt: new Date(Date.now() - 60_000), at: new Date(), sourceKind: 'user', sourceId: null, recordedBy: both.user.id }, transaction),
    );
    const page = (await storage.agent.get(`/api/lots/${later.id}`).expect(200)).body;
    expect(page.locations.map((l: { siteName: string; vials: number; fridgeId: number | null }) => [l.fridgeId, l.siteName, l.vials])).to.deep.equal([[northFridge.id, north.name, 20], [null, 'Another site', 10]]);
    expect(page.history[0].to).to.deep.equal({ fridgeId: null, fridgeCode: '', siteId: null, siteName: 'Another site', timeZone: null });
    // The lot's times are on the clock of the site it reached this user at; each movement's side carries its own.
    expect(page.timeZone).to.equal(north.timeZone);
    expect(page.history[0].from.timeZone).to.equal(north.timeZone);
    const full = (await both.agent.get(`/api/lots/${later.id}`).expect(200)).body;
    expect(full.history[0].to.fridgeId).to.equal(southFridge.id);
    expect(full.history[0].to.timeZone).to.equal(south.timeZone);
  });

  it('lists the lot\'s open planned transfers to a user who sees both sites', async () => {
    const planned = await PlannedTransfer.create({ lotId: later.id, fromSiteId: north.id, toSiteId: south.id, vials: 4, plannedOn: siteDay(south, 2), createdBy: null });
    await PlannedTransfer.create({ lotId: later.id, fromSiteId: north.id, toSiteId: south.id, vials: 1, plannedOn: siteDay(south, 1), status: 'cancelled', createdBy: null });
    expect((await storage.agent.get(`/api/lots/${later.id}`).expect(200)).body.plannedTransfers).to.deep.equal([]);
    const both = await signInAs(['storage'], [north, south]);
    const page = (await both.agent.get(`/api/lots/${later.id}`).expect(200)).body;
    expect(page.plannedTransfers).to.deep.equal([{ id: planned.id, fromSiteId: north.id, fromSiteName: north.name, toSiteId: south.id, toSiteName: south.name, vials: 4, plannedOn: planned.plannedOn }]);
  });
});
