// Bad input at receiving always gets a clear 4xx naming the field or the file, and never leaves a row or a file behind.
import { expect } from 'chai';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createCatalogue, createFridge, lineInput, makeJpeg, pngClaiming, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles, receivingCounts, type ReceivingCounts } from '../../support/receiving-state.js';

describe('receiving refuses bad input and stores nothing', () => {
  // Registers the models first, so the file also runs alone or first.
  before(() => void testContext());
  let setup: Awaited<ReturnType<typeof setUp>>;
  let empty: ReceivingCounts;

  async function setUp() {
    const site = await createSite('NORTH');
    const other = await createSite('SOUTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const elsewhere = await createFridge(other, 'SOUTH-F1');
    const catalogue = await createCatalogue();
    const clerk = await signInAs(['receiving'], [site]);
    const line = (extra: Record<string, unknown> = {}) => ({ ...lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id }), ...extra });
    return { site, fridge, elsewhere, catalogue, clerk, line };
  }

  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
    setup = await setUp();
    empty = await receivingCounts();
  });

  afterEach(async () => {
    expect(await receivingCounts(), 'nothing stored').to.deep.equal(empty);
  });

  function fieldsOf(response: { body: { error: { fields?: { field: string }[] } } }): string[] {
    return (response.body.error.fields ?? []).map((f) => f.field);
  }

  it('a text file named .jpg and sent as image/jpeg is refused by what its bytes are (400, naming the file)', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()]), [
      { content: await makeJpeg(), name: 'good.jpg' },
      { content: Buffer.from('this is not a photo at all, only text pretending'), name: 'box.jpg', type: 'image/jpeg' },
    ]);
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['photos.1']);
    expect(response.body.error.message).to.match(/^box\.jpg: not an image/);
  });

  it('a photo over the size limit is a 413 naming the photos field', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()]), [{ content: Buffer.alloc(16 * 1024 * 1024, 0xff), name: 'huge.jpg' }]);
    expect(response.status).to.equal(413);
    expect(fieldsOf(response)).to.deep.equal(['photos']);
  });

  it('more photos than allowed at once is a 413', async () => {
    const photo = await makeJpeg(32, 32);
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()]), Array.from({ length: 9 }, (_, i) => ({ content: photo, name: `p${i}.jpg` })));
    expect(response.status).to.equal(413);
    expect(response.body.error.message).to.match(/At most 8 photos/);
  });

  it('a decompression bomb (a small PNG claiming 20000 × 20000 pixels) is refused by the pixel limit', async () => {
    const bomb = pngClaiming(20_000, 20_000);
    expect(bomb.length).to.be.below(2000);
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()]), [{ content: bomb, name: 'bomb.png', type: 'image/png' }]);
    expect(response.status).to.equal(413);
    expect(fieldsOf(response)).to.deep.equal(['photos.0']);
    expect(response.body.error.message).to.match(/too many pixels/);
  });

  it('missing fields are each named', async () => {
    const { checks: _checks, arrivedAt: _arrivedAt, ...rest } = shipmentInput([setup.line({ lotNumber: '', expiry: '' })]);
    const response = await postShipment(setup.clerk, setup.site.id, { ...rest, outcome: undefined });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.include.members(['arrivedAt', 'checks', 'outcome', 'lines.0.lotNumber', 'lines.0.expiry']);
  });

  it('an unanswered check is named: every check must be answered', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()], { checks: { containerIntact: true, coolantPresent: null, indicator: null, contentsCold: true } }));
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['checks.coolantPresent', 'checks.indicator']);
  });

  it('negative and fractional counts are refused per field', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line({ vialsBroken: -1, vialsMissing: 1.5 })], { outcome: 'accepted_with_discrepancies' }));
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['lines.0.vialsBroken', 'lines.0.vialsMissing']);
    expect(response.body.error.fields[0].message).to.match(/negative/);
  });

  it('a fridge of another site, an unknown presentation and an accepted lot without a fridge are named', async () => {
    const wrongFridge = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line({ fridgeId: setup.elsewhere.id }), setup.line({ presentationId: 999_999 })]));
    expect(wrongFridge.status).to.equal(400);
    expect(fieldsOf(wrongFridge)).to.deep.equal(['lines.0.fridgeId', 'lines.1.presentationId']);
    const noFridge = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line({ fridgeId: null })]));
    expect(fieldsOf(noFridge)).to.deep.equal(['lines.0.fridgeId']);
  });

  it('an expiry that is no calendar date is named', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line({ expiry: '2028-02-30' })]));
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['lines.0.expiry']);
  });

  it('an arrival in the future and shipping after arrival are named', async () => {
    const response = await postShipment(setup.clerk, setup.site.id, shipmentInput([setup.line()], {
      arrivedAt: new Date(Date.now() + 3_600_000).toISOString(),
      shippedAt: new Date(Date.now() + 7_200_000).toISOString(),
    }));
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['arrivedAt', 'shippedAt']);
  });

  it('a shipment field that is not JSON is a 400 naming it', async () => {
    const response = await setup.clerk.agent.post(`/api/shipments/sites/${setup.site.id}`).set('X-XSRF-TOKEN', setup.clerk.csrf).field('shipment', '{not json');
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['shipment']);
  });

  it('a file in another field than photos is refused', async () => {
    const response = await setup.clerk.agent.post(`/api/shipments/sites/${setup.site.id}`).set('X-XSRF-TOKEN', setup.clerk.csrf)
      .field('shipment', JSON.stringify(shipmentInput([setup.line()])))
      .attach('document', await makeJpeg(), { filename: 'x.jpg', contentType: 'image/jpeg' });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['document']);
  });
});
