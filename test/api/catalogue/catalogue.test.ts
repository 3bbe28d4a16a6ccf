// The catalogue through the API: products with presentations, GTIN rules, suppliers, and proposals from an unknown barcode.
import { expect } from 'chai';
import { AuditEntry, Presentation, Product } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs } from '../../support/test-app.js';
import { createCatalogue, createFridge, lineInput, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../../support/receiving-state.js';

const product = {
  name: 'Meadowline ND spray',
  maker: 'Invented Biologics',
  kind: 'live',
  route: 'spray',
  storageLow: 35,
  storageHigh: 45,
  storageUnit: 'F',
  freezeSensitive: true,
  useWithinMinutes: 120,
  notes: '',
};

describe('the catalogue', () => {
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
  });

  it('purchasing creates a product with the label defaults and a presentation whose GTIN is stored as 14 digits', async () => {
    const { agent, csrf } = await signInAs(['purchasing']);
    const created = await agent.post('/api/catalogue/products').set('X-XSRF-TOKEN', csrf).send(product);
    expect(created.status, JSON.stringify(created.body)).to.equal(201);
    // Withdrawal 21 days when not given: the default.
    expect(created.body).to.include({ withdrawalDays: 21, status: 'confirmed', storageUnit: 'F', storageLow: 35, storageHigh: 45 });
    // GTIN-13 8904000210037 is valid (GS1 "How to calculate a check digit manually").
    const presentation = await agent.post(`/api/catalogue/products/${created.body.id}/presentations`).set('X-XSRF-TOKEN', csrf)
      .send({ dosesPerVial: 2000, packGtin: '8904000210037', vialGtin: '', unitPrice: 55 });
    expect(presentation.status, JSON.stringify(presentation.body)).to.equal(201);
    // Vials come 10 to a pack (common practice): the default.
    expect(presentation.body).to.include({ packGtin: '08904000210037', vialGtin: null, vialsPerPack: 10, dosesPerVial: 2000 });
    const list = await (await signInAs(['crew'])).agent.get('/api/catalogue/products').expect(200);
    expect(list.body.items[0].presentations).to.have.length(1);
    expect(await AuditEntry.count({ where: { action: ['product.create', 'presentation.create'] } })).to.equal(2);
  });

  it('refuses a GTIN with a wrong check digit, a range upside down, and a GTIN already used at the other level', async () => {
    const { agent, csrf } = await signInAs(['admin']);
    const upside = await agent.post('/api/catalogue/products').set('X-XSRF-TOKEN', csrf).send({ ...product, storageLow: 46, storageHigh: 36 });
    expect(upside.status).to.equal(400);
    expect(upside.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['storageHigh']);

    const { product: existing, presentation } = await createCatalogue({ packGtin: '09506000134352' });
    const wrong = await agent.post(`/api/catalogue/products/${existing.id}/presentations`).set('X-XSRF-TOKEN', csrf).send({ dosesPerVial: 1000, packGtin: '8904000210038' });
    expect(wrong.status).to.equal(400);
    expect(wrong.body.error.fields[0]).to.include({ field: 'packGtin' });
    expect(wrong.body.error.fields[0].message).to.match(/should end in 7/);

    const reused = await agent.post(`/api/catalogue/products/${existing.id}/presentations`).set('X-XSRF-TOKEN', csrf).send({ dosesPerVial: 5000, vialGtin: '09506000134352' });
    expect(reused.status).to.equal(409);
    expect(reused.body.error.fields[0].field).to.equal('vialGtin');
    expect(await Presentation.count()).to.equal(1);
    expect(presentation.packGtin).to.equal('09506000134352');
  });

  it('keeps the time out of a fridge a product allows, empty meaning no limit known, and refuses a negative one', async () => {
    const { agent, csrf } = await signInAs(['purchasing']);
    const created = await agent.post('/api/catalogue/products').set('X-XSRF-TOKEN', csrf).send({ ...product, timeOutLimitMinutes: 30 });
    expect(created.status, JSON.stringify(created.body)).to.equal(201);
    expect(created.body.timeOutLimitMinutes).to.equal(30);
    const silent = await agent.post('/api/catalogue/products').set('X-XSRF-TOKEN', csrf).send({ ...product, name: 'Second product' });
    expect(silent.body.timeOutLimitMinutes).to.equal(null);
    const negative = await agent.put(`/api/catalogue/products/${created.body.id}`).set('X-XSRF-TOKEN', csrf).send({ ...product, timeOutLimitMinutes: -5 });
    expect(negative.status).to.equal(400);
    expect(negative.body.error.fields[0]).to.include({ field: 'timeOutLimitMinutes' });
  });

  it('receiving may propose but not edit the catalogue', async () => {
    const { agent, csrf } = await signInAs(['receiving']);
    expect((await agent.post('/api/catalogue/products').set('X-XSRF-TOKEN', csrf).send(product)).status).to.equal(403);
  });

  it('an unknown GTIN at the door becomes a proposed presentation, usable at once; purchasing then confirms it', async () => {
    const site = await createSite('NORTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const clerk = await signInAs(['receiving'], [site]);
    // GTIN 05060917510011 from the Solidsoft GS1 parser wiki "GS1 Data Example".
    const proposal = await clerk.agent.post('/api/catalogue/proposals').set('X-XSRF-TOKEN', clerk.csrf)
      .send({ gtin: '05060917510011', productName: 'New pack from the label', dosesPerVial: 5000 });
    expect(proposal.status, JSON.stringify(proposal.body)).to.equal(201);
    expect(proposal.body.product).to.include({ name: 'New pack from the label', status: 'proposed', kind: null, storageLow: 35, storageHigh: 45, storageUnit: 'F' });
    const proposed = proposal.body.product.presentations.find((p: { id: number }) => p.id === proposal.body.presentationId);
    expect(proposed).to.include({ status: 'proposed', packGtin: '05060917510011', vialsPerPack: 10, proposedBy: clerk.user.name });

    const received = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: proposed.id, fridgeId: fridge.id, lotNumber: '628S93R' })]));
    expect(received.status, JSON.stringify(received.body)).to.equal(201);

    const buyer = await signInAs(['purchasing']);
    const product = await buyer.agent.put(`/api/catalogue/products/${proposal.body.product.id}`).set('X-XSRF-TOKEN', buyer.csrf)
      .send({ name: 'Fernhollow IB spray', maker: 'Invented Biologics', kind: 'live', route: 'spray', storageLow: 2, storageHigh: 8, storageUnit: 'C' });
    expect(product.status, JSON.stringify(product.body)).to.equal(200);
    expect(product.body.status).to.equal('confirmed');
    const confirmed = await buyer.agent.put(`/api/catalogue/presentations/${proposed.id}`).set('X-XSRF-TOKEN', buyer.csrf)
      .send({ dosesPerVial: 2000, vialsPerPack: 10, packGtin: '05060917510011', unitPrice: 61 });
    expect(confirmed.status, JSON.stringify(confirmed.body)).to.equal(200);
    expect(confirmed.body).to.include({ status: 'confirmed', dosesPerVial: 2000 });
    expect(await Product.count({ where: { status: 'proposed' } })).to.equal(0);
  });

  it('a proposal may name an existing product; a GTIN the catalogue knows is not proposed twice', async () => {
    const { product: existing, presentation } = await createCatalogue();
    const { agent, csrf } = await signInAs(['receiving']);
    const known = await agent.post('/api/catalogue/proposals').set('X-XSRF-TOKEN', csrf).send({ gtin: presentation.packGtin, productId: existing.id, dosesPerVial: 1000 });
    expect(known.status).to.equal(409);
    const vial = await agent.post('/api/catalogue/proposals').set('X-XSRF-TOKEN', csrf).send({ gtin: '6291041500213', gtinLevel: 'vial', productId: existing.id, dosesPerVial: 1000 });
    expect(vial.status, JSON.stringify(vial.body)).to.equal(201);
    expect(vial.body.product.presentations.map((p: { vialGtin: string | null }) => p.vialGtin)).to.include('06291041500213');
    const neither = await agent.post('/api/catalogue/proposals').set('X-XSRF-TOKEN', csrf).send({ gtin: '7300011000017', dosesPerVial: 1000 });
    expect(neither.status).to.equal(400);
    expect(neither.body.error.fields[0].field).to.equal('productName');
  });

  it('suppliers: created and renamed by purchasing, with a checked order address', async () => {
    const { agent, csrf } = await signInAs(['purchasing']);
    const bad = await agent.post('/api/catalogue/suppliers').set('X-XSRF-TOKEN', csrf).send({ name: 'Coldline', orderEmail: 'not mail', leadTimeDays: -1 });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['orderEmail', 'leadTimeDays']);
    const created = await agent.post('/api/catalogue/suppliers').set('X-XSRF-TOKEN', csrf).send({ name: 'Coldline', orderEmail: 'Orders@Coldline.example' });
    expect(created.body).to.include({ orderEmail: 'orders@coldline.example', leadTimeDays: 7 });
    const renamed = await agent.put(`/api/catalogue/suppliers/${created.body.id}`).set('X-XSRF-TOKEN', csrf).send({ name: 'Coldline Farm Supply', orderEmail: 'orders@coldline.example', leadTimeDays: 4 });
    expect(renamed.body).to.include({ name: 'Coldline Farm Supply', leadTimeDays: 4 });
  });
});
