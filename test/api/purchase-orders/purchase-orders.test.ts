// Purchase orders: entered by purchasing for a site; the receiving home lists those due today and overdue on the site's own calendar.
import { expect } from 'chai';
import { siteLocalDate } from '../../../shared/receiving/site-local-date.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createCatalogue, createPurchaseOrder } from '../../support/receiving-fixtures.js';

function shiftDays(date: string, days: number): string {
  return new Date(Date.parse(`${date}T12:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

describe('purchase orders', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('purchasing creates an order with lines in packs; it shows vials from the presentation', async () => {
    const site = await createSite('NORTH');
    const catalogue = await createCatalogue();
    const buyer = await signInAs(['purchasing']);
    const response = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({
      supplierId: catalogue.supplier.id, reference: 'PO-7001', expectedDate: '2027-01-15', carrier: 'Frostway', trackingNumber: 'FW123',
      lines: [{ presentationId: catalogue.presentation.id, packs: 3 }],
    });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.include({ reference: 'PO-7001', status: 'open', carrier: 'Frostway', siteId: site.id });
    // 3 packs of 10 vials (hand-computed).
    expect(response.body.lines[0]).to.include({ packs: 3, vials: 30 });
    const duplicate = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({
      supplierId: catalogue.supplier.id, reference: 'PO-7001', expectedDate: '2027-01-15', lines: [{ presentationId: catalogue.presentation.id, packs: 1 }],
    });
    expect(duplicate.status).to.equal(409);
  });

  it('refuses an order without lines, with zero packs, or an unknown presentation, naming each field', async () => {
    const site = await createSite('NORTH');
    const catalogue = await createCatalogue();
    const buyer = await signInAs(['purchasing']);
    const empty = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ supplierId: catalogue.supplier.id, reference: 'X', expectedDate: '2027-02-30', lines: [] });
    expect(empty.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['expectedDate', 'lines']);
    const zero = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ supplierId: catalogue.supplier.id, reference: 'X', expectedDate: '2027-02-01', lines: [{ presentationId: 99999, packs: 0 }] });
    expect(zero.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['lines.0.packs']);
    const unknown = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ supplierId: catalogue.supplier.id, reference: 'X', expectedDate: '2027-02-01', lines: [{ presentationId: 99999, packs: 1 }] });
    expect(unknown.status).to.equal(400);
    expect(unknown.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['lines.0.presentationId']);
  });

  it('the expected list shows open orders due today and overdue by each site\'s own calendar, not cancelled or received ones', async () => {
    const chicago = await createSite('NORTH', 'America/Chicago');
    const tokyo = await createSite('EAST', 'Asia/Tokyo');
    const catalogue = await createCatalogue();
    const todayChicago = siteLocalDate(new Date(), 'America/Chicago');
    const todayTokyo = siteLocalDate(new Date(), 'Asia/Tokyo');
    const due = await createPurchaseOrder(chicago, catalogue, { expectedDate: todayChicago });
    const late = await createPurchaseOrder(chicago, catalogue, { expectedDate: shiftDays(todayChicago, -2) });
    const soon = await createPurchaseOrder(tokyo, catalogue, { expectedDate: shiftDays(todayTokyo, 3) });
    const far = await createPurchaseOrder(tokyo, catalogue, { expectedDate: shiftDays(todayTokyo, 40) });
    const cancelled = await createPurchaseOrder(chicago, catalogue, { expectedDate: todayChicago });
    await cancelled.update({ status: 'cancelled' });
    const tokyoToday = await createPurchaseOrder(tokyo, catalogue, { expectedDate: todayTokyo });

    const clerk = await signInAs(['receiving']);
    const list = await clerk.agent.get('/api/shipments/expected').expect(200);
    const byId = new Map(list.body.items.map((o: { id: number; due: string }) => [o.id, o.due]));
    expect(byId.get(due.id)).to.equal('today');
    expect(byId.get(late.id)).to.equal('overdue');
    expect(byId.get(soon.id)).to.equal('later');
    expect(byId.get(tokyoToday.id)).to.equal('today');
    expect(byId.has(far.id)).to.equal(false);
    expect(byId.has(cancelled.id)).to.equal(false);

    const limited = await signInAs(['receiving'], [chicago]);
    const mine = await limited.agent.get('/api/shipments/expected').expect(200);
    expect(mine.body.items.map((o: { siteId: number }) => o.siteId)).to.satisfy((ids: number[]) => ids.every((id) => id === chicago.id));
  });

  it('an open order can be changed and cancelled; a cancelled one cannot change', async () => {
    const site = await createSite('NORTH');
    const catalogue = await createCatalogue();
    const order = await createPurchaseOrder(site, catalogue);
    const buyer = await signInAs(['purchasing']);
    const body = { supplierId: catalogue.supplier.id, reference: order.reference, expectedDate: '2027-03-01', carrier: 'Frostway', lines: [{ presentationId: catalogue.presentation.id, packs: 5 }] };
    const changed = await buyer.agent.put(`/api/purchase-orders/${order.id}`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    expect(changed.status, JSON.stringify(changed.body)).to.equal(200);
    expect(changed.body.lines[0].packs).to.equal(5);
    expect((await buyer.agent.post(`/api/purchase-orders/${order.id}/cancel`).set('X-XSRF-TOKEN', buyer.csrf)).body.status).to.equal('cancelled');
    expect((await buyer.agent.put(`/api/purchase-orders/${order.id}`).set('X-XSRF-TOKEN', buyer.csrf).send(body)).status).to.equal(409);
  });
});
