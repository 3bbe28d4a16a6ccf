// Transfers and discards through the API: balances, time out of a fridge against the product's limit, planned transfers, refusals.
import { expect } from 'chai';
import { AuditEntry, Hold, PlannedTransfer, StockMovement, type Fridge, type Lot, type Product, type Site } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext, type SignedIn } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { balanceOf } from '../../support/receiving-state.js';

const minute = 60_000;
// One instant per test, so hand-computed minutes never drift by a millisecond between two calls.
let base = Date.now();
const ago = (minutes: number) => new Date(base - minutes * minute).toISOString();

describe('lot movements: transfers and discards', () => {
  let north: Site;
  let south: Site;
  let fridgeA: Fridge;
  let fridgeB: Fridge;
  let fridgeSouth: Fridge;
  let product: Product;
  let lot: Lot;
  let storage: SignedIn;

  before(() => testContext());

  beforeEach(async () => {
    base = Date.now();
    await resetDatabase();
    north = await createSite('NORTH');
    south = await createSite('SOUTH');
    fridgeA = await createFridge(north);
    fridgeB = await createFridge(north);
    fridgeSouth = await createFridge(south);
    product = await createProduct();
    lot = await stockLot(fridgeA, await createPresentation(product, 1000), 50, siteDay(north, 200));
    storage = await signInAs(['storage'], [north, south]);
  });

  const transfer = (who: SignedIn, body: Record<string, unknown>, lotId = lot.id) =>
    who.agent.post(`/api/lots/${lotId}/transfers`).set('X-XSRF-TOKEN', who.csrf).send({ fromFridgeId: fridgeA.id, toFridgeId: fridgeB.id, vials: 5, leftAt: ago(10), at: ago(0), ...body });
  const discard = (who: SignedIn, body: Record<string, unknown>) =>
    who.agent.post(`/api/lots/${lot.id}/discards`).set('X-XSRF-TOKEN', who.csrf).send({ fridgeId: fridgeA.id, vials: 2, reason: 'expired', ...body });
  const transferHolds = () => Hold.findAll({ where: { lotId: lot.id, cause: 'transfer' } });

  it('moves vials within a site: both balances change, one audit entry', async () => {
    await product.update({ timeOutLimitMinutes: 30 });
    const response = await transfer(storage, { vials: 12 });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect([await balanceOf(lot.id, fridgeA.id), await balanceOf(lot.id, fridgeB.id)]).to.deep.equal([38, 12]);
    expect(await AuditEntry.count({ where: { action: 'stock.transfer' } })).to.equal(1);
  });

  it('moves vials to another site when the user has both sites; a user of one site only may not', async () => {
    await product.update({ timeOutLimitMinutes: 120 });
    const ok = await transfer(storage, { toFridgeId: fridgeSouth.id, vials: 7, leftAt: ago(95), at: ago(5) });
    expect(ok.status, JSON.stringify(ok.body)).to.equal(201);
    expect(await balanceOf(lot.id, fridgeSouth.id)).to.equal(7);
    // 90 min out against a limit of 120 (hand-computed): no hold.
    expect(ok.body.timeOutMinutes).to.equal(90);
    expect(ok.body.holdOpened).to.equal(false);
    const northOnly = await signInAs(['storage'], [north]);
    const refused = await transfer(northOnly, { toFridgeId: fridgeSouth.id });
    expect(refused.status).to.equal(400);
    expect(refused.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['toFridgeId']);
    expect(await balanceOf(lot.id, fridgeSouth.id)).to.equal(7);
  });

  it('time out over the product limit opens a transfer hold naming the minutes and the limit; under it does not', async () => {
    await product.update({ timeOutLimitMinutes: 30 });
    // 29 min < 30 (hand-computed): no hold.
    const under = await transfer(storage, { leftAt: ago(29), at: ago(0) });
    expect(under.body.holdOpened).to.equal(false);
    expect(await transferHolds()).to.have.length(0);
    // Exactly at the limit is not over it.
    expect((await transfer(storage, { leftAt: ago(30), at: ago(0) })).body.holdOpened).to.equal(false);
    // 45 min > 30 (hand-computed): a hold on the movement.
    const over = await transfer(storage, { leftAt: ago(50), at: ago(5) });
    expect(over.status).to.equal(201);
    expect(over.body).to.include({ timeOutMinutes: 45, limitMinutes: 30, holdOpened: true });
    const holds = await transferHolds();
    expect(holds).to.have.length(1);
    expect(holds[0]!.sourceKind).to.equal('stock_movement');
    expect(holds[0]!.sourceId).to.equal(over.body.movementId);
    expect(holds[0]!.reason).to.contain('45 min').and.contain('limit of 30 min');
  });

  it('with no limit recorded any time out holds the lot; zero minutes out does not', async () => {
    expect(product.timeOutLimitMinutes ?? null).to.equal(null);
    const same = ago(0);
    expect((await transfer(storage, { leftAt: same, at: same })).body.holdOpened).to.equal(false);
    const oneMinute = await transfer(storage, { leftAt: ago(1), at: ago(0) });
    expect(oneMinute.body.holdOpened).to.equal(true);
    expect((await transferHolds())[0]!.reason).to.contain('no recorded time-out limit');
  });

  it('a held lot may still be moved and stays held', async () => {
    await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'warm box', openedBy: null });
    await product.update({ timeOutLimitMinutes: 60 });
    expect((await transfer(storage, {})).status).to.equal(201);
    expect(await Hold.count({ where: { lotId: lot.id } })).to.equal(1);
  });

  it('refuses bad times and sides, naming the field, and stores nothing', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ leftAt: ago(0), at: ago(10) }, 'at'],
      [{ leftAt: ago(10), at: new Date(Date.now() + 60 * minute).toISOString() }, 'at'],
      [{ leftAt: ago(100 * 1440), at: ago(0) }, 'leftAt'],
      [{ toFridgeId: fridgeA.id }, 'toFridgeId'],
      [{ vials: 0 }, 'vials'],
      [{ vials: 2.5 }, 'vials'],
      [{ leftAt: 'yesterday' }, 'leftAt'],
    ];
    for (const [body, field] of cases) {
      const response = await transfer(storage, body);
      expect(response.status, JSON.stringify(body)).to.equal(400);
      expect(response.body.error.fields.map((f: { field: string }) => f.field), JSON.stringify(body)).to.include(field);
    }
    const tooMany = await transfer(storage, { vials: 51 });
    expect(tooMany.status).to.equal(409);
    expect(tooMany.body.error.fields[0].field).to.equal('vials');
    expect(await StockMovement.count()).to.equal(1);
  });

  it('20 concurrent transfers of 5 vials from 50: exactly 10 succeed and the source ends at 0, never below', async function () {
    this.timeout(60_000);
    await product.update({ timeOutLimitMinutes: 60 });
    const responses = await Promise.all(Array.from({ length: 20 }, () => transfer(storage, { vials: 5 })));
    const statuses = responses.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).to.have.length(10);
    expect(statuses.filter((s) => s === 409)).to.have.length(10);
    expect([await balanceOf(lot.id, fridgeA.id), await balanceOf(lot.id, fridgeB.id)]).to.deep.equal([0, 50]);
    expect(await StockMovement.count({ where: { kind: 'transfer' } })).to.equal(10);
  });

  it('opposite transfers at once take turns instead of deadlocking: 10 each way, all succeed (hand-computed balances)', async function () {
    this.timeout(60_000);
    await product.update({ timeOutLimitMinutes: 60 });
    // 20 to B first, so both fridges hold the lot: A 30, B 20.
    expect((await transfer(storage, { vials: 20 })).status).to.equal(201);
    const responses = await Promise.all(
      Array.from({ length: 20 }, (_, i) => (i % 2 ? transfer(storage, { vials: 1 }) : transfer(storage, { fromFridgeId: fridgeB.id, toFridgeId: fridgeA.id, vials: 2 }))),
    );
    expect(responses.map((r) => r.status)).to.deep.equal(Array(20).fill(201));
    // A: 30 − 10·1 + 10·2 = 40; B: 20 + 10·1 − 10·2 = 10.
    expect([await balanceOf(lot.id, fridgeA.id), await balanceOf(lot.id, fridgeB.id)]).to.deep.equal([40, 10]);
  });

  it('carries out a planned transfer and closes it; a second use or a wrong lot is refused', async () => {
    await product.update({ timeOutLimitMinutes: 60 });
    const planned = await PlannedTransfer.create({ lotId: lot.id, fromSiteId: north.id, toSiteId: south.id, vials: 5, plannedOn: siteDay(south, 1), createdBy: null });
    const done = await transfer(storage, { toFridgeId: fridgeSouth.id, plannedTransferId: planned.id });
    expect(done.status, JSON.stringify(done.body)).to.equal(201);
    expect((await planned.reload()).status).to.equal('done');
    const again = await transfer(storage, { toFridgeId: fridgeSouth.id, plannedTransferId: planned.id });
    expect(again.status).to.equal(409);
    const wrongWay = await PlannedTransfer.create({ lotId: lot.id, fromSiteId: south.id, toSiteId: north.id, vials: 5, plannedOn: siteDay(south, 1), createdBy: null });
    const refused = await transfer(storage, { toFridgeId: fridgeSouth.id, plannedTransferId: wrongWay.id });
    expect(refused.status).to.equal(400);
    expect(refused.body.error.fields[0].field).to.equal('plannedTransferId');
    expect((await wrongWay.reload()).status).to.equal('planned');
    expect(await balanceOf(lot.id, fridgeSouth.id)).to.equal(5);
  });

  it('discards for a reason: expired, damaged, other with its text', async () => {
    expect((await discard(storage, { reason: 'expired' })).status).to.equal(201);
    expect((await discard(storage, { reason: 'damaged', reasonText: 'vial cracked' })).status).to.equal(201);
    const noText = await discard(storage, { reason: 'other' });
    expect(noText.status).to.equal(400);
    expect(noText.body.error.fields[0].field).to.equal('reasonText');
    expect((await discard(storage, { reason: 'other', reasonText: 'label soaked off' })).status).to.equal(201);
    expect((await discard(storage, { reason: 'lost' })).status).to.equal(400);
    expect(await balanceOf(lot.id, fridgeA.id)).to.equal(44);
    const reasons = (await StockMovement.findAll({ where: { kind: 'discard' }, order: [['id', 'ASC']] })).map((m) => m.reason);
    expect(reasons).to.deep.equal(['expired', 'damaged: vial cracked', 'other: label soaked off']);
    expect((await discard(storage, { vials: 45 })).status).to.equal(409);
  });

  it('a held lot is discarded by the veterinarian, not here, unless the vials are damaged', async () => {
    await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'warm box', openedBy: null });
    const refused = await discard(storage, { reason: 'expired' });
    expect(refused.status).to.equal(409);
    expect(refused.body.error.fields[0].field).to.equal('reason');
    expect((await discard(storage, { reason: 'damaged' })).status).to.equal(201);
    expect(await balanceOf(lot.id, fridgeA.id)).to.equal(48);
  });

  it('only storage staff and admins move stock', async () => {
    const vet = await signInAs(['veterinarian'], [north]);
    expect((await transfer(vet, {})).status).to.equal(403);
    expect((await discard(vet, {})).status).to.equal(403);
  });
});
