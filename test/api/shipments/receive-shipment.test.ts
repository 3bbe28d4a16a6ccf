// Receiving through the API: photos, lots, receive movements, partial acceptance, refusal, arrival holds, the same lot twice.
import { expect } from 'chai';
import sharp from 'sharp';
import { AuditEntry, Hold, Lot, PurchaseOrder, Shipment, StockMovement } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { clearCaughtMail } from '../../support/mail-catcher.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createCatalogue, createFridge, createPurchaseOrder, lineInput, makeJpeg, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { balanceOf, clearPhotoFiles, movementSum, receivingCounts } from '../../support/receiving-state.js';

describe('receiving a shipment', () => {
  // Registers the models first, so the file also runs alone or first.
  before(() => void testContext());
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
    clearPhotoFiles();
  });

  async function setUp() {
    const site = await createSite('NORTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const catalogue = await createCatalogue();
    const clerk = await signInAs(['receiving'], [site]);
    return { site, fridge, catalogue, clerk };
  }

  it('a clean shipment against an order, with two real JPEG photos: lots, receive movements, balances, photos, order received', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const order = await createPurchaseOrder(site, catalogue, { packs: 2 });
    const lines = [lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'A100', expiry: '2028-03', expected: 20 })];
    const photos = [
      { content: await makeJpeg(800, 600), name: 'outer-box.jpg' },
      { content: await makeJpeg(600, 800), name: 'contents.jpg' },
    ];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { purchaseOrderId: order.id }), photos);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.include({ outcome: 'accepted', supplierName: catalogue.supplier.name, purchaseOrderReference: order.reference, photoCount: 2 });
    expect(response.body.discrepancies).to.deep.equal([]);
    const [line] = response.body.lines;
    // Month/year expiry is the last day of that month (PHAC National Vaccine Storage and Handling Guidelines 2007 §8.2).
    expect(line).to.include({ lotNumber: 'A100', expiry: '2028-03-31', expiryDayGiven: false, vialsStocked: 20 });
    expect(line.holds).to.deep.equal([]);

    const lot = await Lot.findByPk(line.lotId);
    expect(lot).to.include({ lotNumber: 'A100', expiry: '2028-03-31', presentationId: catalogue.presentation.id });
    const movements = await StockMovement.findAll({ where: { lotId: lot!.id } });
    expect(movements.map((m) => [m.kind, m.vials, m.toFridgeId, m.fromFridgeId])).to.deep.equal([['receive', 20, fridge.id, null]]);
    expect(await balanceOf(lot!.id, fridge.id)).to.equal(20);
    expect((await PurchaseOrder.findByPk(order.id))!.status).to.equal('received');
    expect(await AuditEntry.count({ where: { action: 'shipment.receive' } })).to.equal(1);

    for (const photo of response.body.photos) {
      const display = await clerk.agent.get(photo.displayUrl).buffer(true).expect(200);
      expect(display.headers['content-type']).to.equal('image/jpeg');
      expect((await sharp(display.body).metadata()).format).to.equal('jpeg');
      const thumb = await clerk.agent.get(photo.thumbUrl).buffer(true).expect(200);
      const size = await sharp(thumb.body).metadata();
      expect(Math.max(size.width!, size.height!)).to.equal(320);
    }
    const list = await clerk.agent.get(`/api/shipments?siteId=${site.id}`).expect(200);
    expect(list.body.items.map((s: { id: number }) => s.id)).to.deep.equal([response.body.id]);
  });

  it('partial acceptance: only the intact vials of accepted lines enter stock, and the report is due', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const lines = [
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'KEEP1', expected: 20, broken: 2, missing: 1 }),
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: null, lotNumber: 'BACK1', expected: 10, accepted: false }),
    ];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { outcome: 'accepted_with_discrepancies' }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    const [kept, refused] = response.body.lines;
    expect(kept).to.include({ accepted: true, vialsIntact: 17, vialsStocked: 17 });
    expect(refused).to.include({ accepted: false, vialsStocked: 0, lotId: null });
    expect(await balanceOf(kept.lotId, fridge.id)).to.equal(17);
    expect(await Lot.count()).to.equal(1);
    expect(response.body.discrepancies.map((d: { kind: string }) => d.kind)).to.have.members(['broken', 'missing', 'line_refused']);
  });

  it('an "accepted" outcome with discrepancies is refused with a field error, and nothing is stored', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const lines = [lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, expected: 10, broken: 1 })];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { outcome: 'accepted' }));
    expect(response.status).to.equal(400);
    expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['outcome']);
    expect(await Shipment.count()).to.equal(0);
  });

  it('refusal: no lot, no movement, the order stays open for the supplier to resend', async () => {
    const { site, catalogue, clerk } = await setUp();
    const order = await createPurchaseOrder(site, catalogue);
    const lines = [lineInput({ presentationId: catalogue.presentation.id, fridgeId: null, lotNumber: 'NOPE1' })];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { purchaseOrderId: order.id, outcome: 'refused', checks: { containerIntact: false, coolantPresent: false, indicator: 'triggered', contentsCold: false } }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.outcome).to.equal('refused');
    const counts = await receivingCounts();
    expect({ lots: counts.lots, movements: counts.stock_movements, holds: counts.holds }).to.deep.equal({ lots: 0, movements: 0, holds: 0 });
    expect((await PurchaseOrder.findByPk(order.id))!.status).to.equal('open');
    expect(response.body.discrepancies.map((d: { kind: string }) => d.kind)).to.include.members(['container_damaged', 'coolant_missing', 'indicator_triggered', 'not_cold', 'shipment_refused']);
  });

  it('warm arrival: a reading above the label range puts every accepted lot on hold, with the reason', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const lines = [
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'WARM1' }),
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'WARM2' }),
    ];
    // 52 °F is above a 35–45 °F label range (common practice range; hand-computed comparison).
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { outcome: 'accepted_with_discrepancies', reading: { value: 52, unit: 'F', place: 'product_surface' } }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    for (const line of response.body.lines) {
      expect(line.holds).to.have.length(1);
      expect(line.holds[0]).to.include({ cause: 'arrival', sourceKind: 'shipment', sourceId: response.body.id });
      expect(line.holds[0].reason).to.match(/52 °F is above .* 35–45 °F/);
    }
    expect(response.body.lotsOnHold).to.equal(2);
    expect(await Hold.count()).to.equal(2);
    // Held vials are still stock (kept cold until the veterinarian decides), not discarded.
    expect(await balanceOf(response.body.lines[0].lotId, fridge.id)).to.equal(20);
  });

  it('a reading inside a °C label range is no hold: 46 °F = 7.78 °C lies within 2–8 °C (NIST SP 811 conversion)', async () => {
    const { site, fridge, clerk } = await setUp();
    const celsius = await createCatalogue({ low: 2, high: 8, unit: 'C' });
    const lines = [lineInput({ presentationId: celsius.presentation.id, fridgeId: fridge.id })];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { reading: { value: 46, unit: 'F', place: 'probe' } }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.lines[0].holds).to.deep.equal([]);
  });

  it('a triggered indicator or contents not cold hold the lots even without a warm reading', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const lines = [lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { outcome: 'accepted_with_discrepancies', checks: { containerIntact: true, coolantPresent: true, indicator: 'triggered', contentsCold: true } }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.lines[0].holds[0].reason).to.match(/indicator was triggered/);
  });

  it('the same lot received twice adds to the same lot; a different expiry for it is a 409 and stores nothing', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const first = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'TWICE', expiry: '2028-03-31', expected: 20 })]));
    // Typed in lower case the second time: the same lot.
    const second = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'twice', expiry: '2028-03', expected: 30 })]));
    expect(first.status).to.equal(201);
    expect(second.status, JSON.stringify(second.body)).to.equal(201);
    expect(second.body.lines[0].lotId).to.equal(first.body.lines[0].lotId);
    expect(await Lot.count()).to.equal(1);
    expect(await balanceOf(first.body.lines[0].lotId, fridge.id)).to.equal(50);
    expect(await movementSum(first.body.lines[0].lotId, fridge.id)).to.equal(50);

    const before = await receivingCounts();
    const clash = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'TWICE', expiry: '2028-04-30' })]), [
      { content: await makeJpeg(), name: 'box.jpg' },
    ]);
    expect(clash.status).to.equal(409);
    expect(clash.body.error.message).to.match(/already recorded with expiry 2028-03-31/);
    expect(clash.body.error.fields[0].field).to.equal('lines.0.expiry');
    expect(await receivingCounts()).to.deep.equal(before);
  });

  it('sending the same draft twice (a retry after a lost connection) records one shipment', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const draft = shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })]);
    const first = await postShipment(clerk, site.id, draft, [{ content: await makeJpeg(), name: 'a.jpg' }]);
    const again = await postShipment(clerk, site.id, draft, [{ content: await makeJpeg(), name: 'a.jpg' }]);
    expect(first.status).to.equal(201);
    expect(again.status).to.equal(200);
    expect(again.body.id).to.equal(first.body.id);
    const counts = await receivingCounts();
    expect([counts.shipments, counts.stock_movements, counts.shipment_photos, counts.photoFiles]).to.deep.equal([1, 1, 1, 2]);
  });

  it('an order already received cannot be received again', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const order = await createPurchaseOrder(site, catalogue);
    const lines = () => [lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })];
    expect((await postShipment(clerk, site.id, shipmentInput(lines(), { purchaseOrderId: order.id }))).status).to.equal(201);
    const again = await postShipment(clerk, site.id, shipmentInput(lines(), { purchaseOrderId: order.id }));
    expect(again.status).to.equal(409);
    expect(again.body.error.fields[0].field).to.equal('purchaseOrderId');
  });

  it('a lot put away later than the site allows is received with a warning', async () => {
    const { site, fridge, catalogue, clerk } = await setUp();
    const arrivedAt = new Date(Date.now() - 3 * 3_600_000);
    const line = { ...lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id }), storedAt: new Date(arrivedAt.getTime() + 95 * 60_000).toISOString() };
    const response = await postShipment(clerk, site.id, shipmentInput([line], { arrivedAt: arrivedAt.toISOString(), shippedAt: null }));
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    // The foundation's default storeWithinMinutes is 30: 95 minutes is late (hand-computed).
    expect(response.body.warnings.map((w: { kind: string }) => w.kind)).to.include('stored_late');
    expect(response.body.warnings.find((w: { kind: string }) => w.kind === 'stored_late').message).to.match(/95 min after arrival/);
  });
});
