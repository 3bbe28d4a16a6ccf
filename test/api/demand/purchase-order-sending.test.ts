// Orders from suggestions: created through receiving's own service, sent as a PDF to the supplier's order address, then expected at receiving.
import { expect } from 'chai';
import { AuditEntry, PurchaseOrder, PurchaseOrderSending } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { caughtMail, clearCaughtMail } from '../../support/mail-catcher.js';
import { firstPagePng, inkShare, pdfText } from '../../support/pdf-pages.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createSupplier, createVaccination, siteDay } from '../../support/flock-fixtures.js';

describe('purchase orders from suggestions', () => {
  before(() => void testContext());
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
  });

  async function setUp() {
    const site = await createSite('NORTH');
    const product = await createProduct({ name: 'Spray vaccine A' });
    const presentation = await createPresentation(product, 20_000, { unitPrice: 250 });
    const supplier = await createSupplier(5, 'orders@coldchain-supply.example');
    await createVaccination(await createFlock(await createHouse(site), { birds: 20_000 }), product, siteDay(site, 30));
    const buyer = await signInAs(['purchasing']);
    await buyer.agent.put(`/api/demand/sites/${site.id}/products/${product.id}/settings`).set('X-XSRF-TOKEN', buyer.csrf).send({ safetyStockKind: 'doses', safetyStockValue: 0, supplierId: supplier.id }).expect(200);
    const projection = async () => (await buyer.agent.get(`/api/demand/sites/${site.id}/projection`).expect(200)).body;
    return { site, product, presentation, supplier, buyer, projection };
  }

  it('turns the suggestion into an order, mails the PDF to the supplier, records the sending, and receiving expects it', async () => {
    const { site, presentation, supplier, buyer, projection } = await setUp();
    const before = await projection();
    const suggestion = before.suggestions[0];
    expect(suggestion).to.include({ presentationId: presentation.id, packs: 1, supplierId: supplier.id });
    const response = await buyer.agent
      .post(`/api/demand/sites/${site.id}/orders`)
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ supplierId: supplier.id, reference: before.nextReference, expectedDate: siteDay(site, 5), notes: 'Deliver to the service building.', lines: [{ presentationId: presentation.id, packs: suggestion.packs }] });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.deep.include({ reference: before.nextReference, status: 'open' });
    expect(response.body.lastSent).to.deep.include({ to: 'orders@coldchain-supply.example', mailed: true });
    expect(before.nextReference).to.equal(`NORTH-${siteDay(site).replaceAll('-', '')}-1`);

    const mail = await caughtMail();
    expect(mail).to.have.length(1);
    expect(mail[0]!.to).to.deep.include({ text: 'orders@coldchain-supply.example' });
    expect(mail[0]!.subject).to.equal(`Purchase order ${before.nextReference} from ${site.name}`);
    expect(mail[0]!.text).to.contain('1 pack (10 vials, 200,000 doses)');
    const attachment = mail[0]!.attachments[0]!;
    expect(attachment).to.include({ contentType: 'application/pdf', filename: `purchase-order-${before.nextReference}.pdf` });
    const text = pdfText(attachment.content);
    for (const expected of ['Purchase order', before.nextReference, site.name, supplier.name, `Deliver by ${siteDay(site, 5)}`, 'Spray vaccine A, 20,000 doses × 10 vials', '200,000', 'store at 35–45 °F', 'Deliver to the service building.']) {
      expect(text, expected).to.contain(expected);
    }
    // Money as the app shows it (CurrencyPipe, en-US, USD): $250.00 a vial × 10 vials = $2,500.00 (hand-computed).
    expect(text).to.match(/\$250\.00\s+\$2,500\.00/);
    expect(text).to.contain('Total $2,500.00');
    expect(text).to.match(new RegExp(`Purchase order ${before.nextReference} · ${site.name} · Made by Vialyard on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d C[SD]T`));
    expect(await inkShare(firstPagePng(attachment.content)), 'the first page is not blank').to.be.greaterThan(0.005);

    expect(await PurchaseOrderSending.count()).to.equal(1);
    expect(await AuditEntry.count({ where: { action: ['purchase_order.create', 'purchase_order.send'] } })).to.equal(2);
    expect((await projection()).suggestions).to.deep.equal([]);

    const clerk = await signInAs(['receiving'], [site]);
    const expected = await clerk.agent.get(`/api/shipments/expected?siteId=${site.id}`).expect(200);
    expect(expected.body.items.map((o: { reference: string }) => o.reference)).to.deep.equal([before.nextReference]);
    const pdf = await clerk.agent.get(`/api/demand/purchase-orders/${response.body.id}/pdf`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).to.equal(200);
    expect(pdf.headers['content-type']).to.match(/application\/pdf/);
    expect(pdfText(pdf.body as Buffer)).to.contain(before.nextReference);
  });

  it('refuses bad lines naming the field, and stores and sends nothing', async () => {
    const { site, supplier, buyer } = await setUp();
    const response = await buyer.agent.post(`/api/demand/sites/${site.id}/orders`).set('X-XSRF-TOKEN', buyer.csrf).send({ supplierId: supplier.id, reference: 'X-1', expectedDate: siteDay(site, 5), lines: [{ presentationId: 999, packs: 0 }] });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields.map((f: { field: string }) => f.field)).to.include('lines.0.packs');
    expect(await PurchaseOrder.count()).to.equal(0);
    expect(await caughtMail()).to.have.length(0);
  });

  it('sends a hand-entered open order again on request, and refuses to send a cancelled one', async () => {
    const { site, presentation, supplier, buyer } = await setUp();
    const created = await buyer.agent.post(`/api/purchase-orders/sites/${site.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ supplierId: supplier.id, reference: 'HAND-1', expectedDate: siteDay(site, 5), lines: [{ presentationId: presentation.id, packs: 2 }] });
    expect(created.status).to.equal(201);
    for (let i = 0; i < 2; i++) await buyer.agent.post(`/api/demand/purchase-orders/${created.body.id}/send`).set('X-XSRF-TOKEN', buyer.csrf).expect(200);
    expect(await PurchaseOrderSending.count({ where: { purchaseOrderId: created.body.id } })).to.equal(2);
    await buyer.agent.post(`/api/purchase-orders/${created.body.id}/cancel`).set('X-XSRF-TOKEN', buyer.csrf).expect(200);
    expect((await buyer.agent.post(`/api/demand/purchase-orders/${created.body.id}/send`).set('X-XSRF-TOKEN', buyer.csrf)).status).to.equal(409);
  });
});
