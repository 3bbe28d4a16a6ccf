// Stock counts through the API: the sheet's expected vials, adjustments from differences, the stale sheet, count due.
import { expect } from 'chai';
import { AuditEntry, StockCount, StockMovement, type Fridge, type Lot, type Site } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext, type SignedIn } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { balanceOf } from '../../support/receiving-state.js';
import { ownerConnection } from '../../support/test-database.js';

describe('stock counts', () => {
  let site: Site;
  let fridge: Fridge;
  let early: Lot;
  let late: Lot;
  let storage: SignedIn;

  before(() => testContext());

  beforeEach(async () => {
    await resetDatabase();
    site = await createSite('COUNT');
    fridge = await createFridge(site);
    const presentation = await createPresentation(await createProduct(), 1000);
    late = await stockLot(fridge, presentation, 20, siteDay(site, 300), { lotNumber: 'LATE1' });
    early = await stockLot(fridge, presentation, 12, siteDay(site, 90), { lotNumber: 'EARLY1' });
    storage = await signInAs(['storage'], [site]);
  });

  const sheet = (who = storage, fridgeId = fridge.id) => who.agent.get(`/api/stock-counts/fridges/${fridgeId}/sheet`);
  const submit = (body: object, who = storage) => who.agent.post(`/api/stock-counts/fridges/${fridge.id}`).set('X-XSRF-TOKEN', who.csrf).send(body);

  it('the sheet lists each lot in the fridge with the vials expected, earliest expiry first', async () => {
    const response = await sheet();
    expect(response.status).to.equal(200);
    expect(response.body.lines.map((l: { lotNumber: string; expected: number }) => [l.lotNumber, l.expected])).to.deep.equal([['EARLY1', 12], ['LATE1', 20]]);
    expect(response.body.due).to.include({ due: true });
    expect(response.body.due.reasons).to.deep.equal(['never_counted']);
  });

  it('a count with differences posts adjust movements, keeps the lines and makes the fridge not due', async () => {
    const response = await submit({
      lines: [
        { lotId: early.id, expected: 12, counted: 10, reason: 'two vials broken' },
        { lotId: late.id, expected: 20, counted: 21, reason: 'one vial left in a tray' },
      ],
    });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.adjustments).to.equal(2);
    // 12 − 2 = 10 and 20 + 1 = 21 (hand-computed).
    expect([await balanceOf(early.id, fridge.id), await balanceOf(late.id, fridge.id)]).to.deep.equal([10, 21]);
    const adjusts = await StockMovement.findAll({ where: { kind: 'adjust' }, order: [['lotId', 'ASC']] });
    expect(adjusts.map((m) => [m.lotId, m.vials, m.fromFridgeId, m.toFridgeId, m.sourceKind, m.sourceId])).to.deep.equal([
      [late.id, 1, null, fridge.id, 'stock_count', response.body.id],
      [early.id, 2, fridge.id, null, 'stock_count', response.body.id],
    ].sort((a, b) => (a[0] as number) - (b[0] as number)));
    expect(await AuditEntry.count({ where: { action: 'stock.count' } })).to.equal(1);
    const after = await sheet();
    expect(after.body.due.due).to.equal(false);
    expect(after.body.recentCounts[0].lines.map((l: { difference: number }) => l.difference)).to.have.members([-2, 1]);
  });

  it('a count with no difference posts nothing; a difference without a reason is a 400 naming the line', async () => {
    expect((await submit({ lines: [{ lotId: early.id, expected: 12, counted: 12 }, { lotId: late.id, expected: 20, counted: 20 }] })).status).to.equal(201);
    expect(await StockMovement.count({ where: { kind: 'adjust' } })).to.equal(0);
    const noReason = await submit({ lines: [{ lotId: early.id, expected: 12, counted: 11 }, { lotId: late.id, expected: 20, counted: 20 }] });
    expect(noReason.status).to.equal(400);
    expect(noReason.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['lines.0.reason']);
    expect(await StockCount.count()).to.equal(1);
  });

  it('a sheet opened before vials moved is refused with a 409 asking to reload; nothing is stored', async () => {
    const seen = (await sheet()).body.lines as { lotId: number; expected: number }[];
    // Someone takes 2 vials of the early lot after the sheet was opened.
    await testContext().sequelize.transaction((transaction) =>
      StockMovement.create({ lotId: early.id, kind: 'discard', vials: 2, fromFridgeId: fridge.id, toFridgeId: null, leftAt: null, at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null }, { transaction }),
    );
    const response = await submit({ lines: seen.map((l) => ({ lotId: l.lotId, expected: l.expected, counted: l.expected - 1, reason: 'one short' })) });
    expect(response.status).to.equal(409);
    expect(response.body.error.message).to.match(/reload/);
    expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['lines.0.expected']);
    expect(await StockCount.count()).to.equal(0);
    expect(await balanceOf(early.id, fridge.id)).to.equal(10);
    // A lot that arrived after the sheet was opened also makes it stale.
    const missing = await submit({ lines: [{ lotId: late.id, expected: 20, counted: 20 }] });
    expect(missing.status).to.equal(409);
    expect(missing.body.error.fields[0].field).to.equal('lines');
  });

  it('a lot never in the fridge is a 400 naming it', async () => {
    const elsewhere = await stockLot(await createFridge(site), await createPresentation(await createProduct(), 500), 3, siteDay(site, 100));
    const response = await submit({ lines: [{ lotId: early.id, expected: 12, counted: 12 }, { lotId: late.id, expected: 20, counted: 20 }, { lotId: elsewhere.id, expected: 0, counted: 1, reason: 'found' }] });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('lines.2.lotId');
  });

  it('count due: over 30 days since the last count, or a receipt since it; listed for the user\'s sites only', async () => {
    const other = await createSite('ELSEWHERE');
    await createFridge(other);
    const second = await createFridge(site);
    const admin = await signInAs(['admin']);
    await submit({ lines: [{ lotId: early.id, expected: 12, counted: 12 }, { lotId: late.id, expected: 20, counted: 20 }] });
    await admin.agent.post(`/api/stock-counts/fridges/${second.id}`).set('X-XSRF-TOKEN', admin.csrf).send({ lines: [] }).expect(201);
    let due = (await storage.agent.get('/api/stock-counts/due').expect(200)).body.items;
    expect(due).to.deep.equal([]);
    // The owner moves the first count 31 days back (the application may not change counts).
    await ownerConnection().query(`UPDATE stock_counts SET counted_at = now() - interval '31 days' WHERE fridge_id = ${fridge.id}`);
    // And a shipment's vials go into the second fridge after its count.
    await stockLot(second, await createPresentation(await createProduct(), 500), 4, siteDay(site, 100));
    due = (await storage.agent.get('/api/stock-counts/due').expect(200)).body.items;
    // The first fridge's lots were received today, which is now after its (moved-back) count too.
    expect(due.map((d: { fridgeId: number; reasons: string[] }) => [d.fridgeId, d.reasons])).to.deep.equal([
      [fridge.id, ['over_interval', 'received_since']],
      [second.id, ['received_since']],
    ]);
    // The admin sees every site, the never-counted fridge elsewhere too.
    expect((await admin.agent.get('/api/stock-counts/due').expect(200)).body.items).to.have.length(3);
  });

  it('veterinarians read sheets but do not count; another site\'s fridge is a 404', async () => {
    const vet = await signInAs(['veterinarian'], [site]);
    expect((await sheet(vet)).status).to.equal(200);
    expect((await submit({ lines: [] }, vet)).status).to.equal(403);
    const stranger = await signInAs(['storage'], [await createSite('OTHER')]);
    expect((await sheet(stranger)).status).to.equal(404);
  });

  it('counts are records: the application role cannot change or remove them (SQLSTATE 42501)', async () => {
    await submit({ lines: [{ lotId: early.id, expected: 12, counted: 12 }, { lotId: late.id, expected: 20, counted: 20 }] }).expect(201);
    for (const sql of ['UPDATE stock_counts SET notes = \'x\'', 'DELETE FROM stock_count_lines', 'UPDATE stock_count_lines SET counted = 0']) {
      let code: string | undefined;
      try {
        await testContext().sequelize.query(sql);
      } catch (error) {
        code = (error as { original?: { code?: string } }).original?.code;
      }
      expect(code, sql).to.equal('42501');
    }
  });
});
