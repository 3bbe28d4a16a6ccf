// Photos are kept upright and without metadata (GPS included), and served only to people who may see the shipment's site.
import { expect } from 'chai';
import sharp from 'sharp';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs } from '../../support/test-app.js';
import { createCatalogue, createFridge, lineInput, makeJpeg, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles, receivingCounts } from '../../support/receiving-state.js';

function binary(call: ReturnType<ReturnType<typeof import('supertest').agent>['get']>) {
  return call.buffer(true).parse((res, callback) => {
    const chunks: Buffer[] = [];
    res.on('data', (chunk: Buffer) => chunks.push(chunk));
    res.on('end', () => callback(null, Buffer.concat(chunks)));
  });
}

describe('shipment photos', () => {
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
  });

  async function shipmentWithPhoto(photo: Buffer) {
    const site = await createSite('NORTH');
    const other = await createSite('SOUTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const catalogue = await createCatalogue();
    const clerk = await signInAs(['receiving'], [site]);
    const response = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })]), [{ content: photo, name: 'C:\\phone\\DCIM\\IMG_0042.JPG' }]);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    return { site, other, clerk, shipment: response.body };
  }

  it('applies the EXIF orientation and strips every metadata block, GPS included', async () => {
    const original = await makeJpeg(400, 200, { orientation: 6, gps: true });
    const before = await sharp(original).metadata();
    expect(before.orientation).to.equal(6);
    // Tag 0x8825 (little-endian 25 88) points at the EXIF GPS block: the test photo carries a location.
    expect(before.exif!.includes(Buffer.from([0x25, 0x88])), 'the test photo carries GPS').to.equal(true);
    const { clerk, shipment } = await shipmentWithPhoto(original);
    const display = (await binary(clerk.agent.get(shipment.photos[0].displayUrl)).expect(200)).body as Buffer;
    const after = await sharp(display).metadata();
    // Orientation 6 means "rotate 90° clockwise to view": the 400 × 200 sensor image is shown 200 × 400.
    expect([after.width, after.height]).to.deep.equal([200, 400]);
    expect(after.orientation).to.equal(undefined);
    expect(after.exif).to.equal(undefined);
    expect(after.xmp).to.equal(undefined);
    expect(display.includes(Buffer.from('TestCam'))).to.equal(false);
  });

  it('keeps a display size of at most 1600 px and a 320 px thumbnail under generated names', async () => {
    const { clerk, shipment } = await shipmentWithPhoto(await makeJpeg(2400, 1800));
    const display = await sharp((await binary(clerk.agent.get(shipment.photos[0].displayUrl)).expect(200)).body as Buffer).metadata();
    const thumb = await sharp((await binary(clerk.agent.get(shipment.photos[0].thumbUrl)).expect(200)).body as Buffer).metadata();
    expect([display.width, display.height]).to.deep.equal([1600, 1200]);
    expect([thumb.width, thumb.height]).to.deep.equal([320, 240]);
    expect((await receivingCounts()).photoFiles).to.equal(2);
  });

  it('is served to storage staff of the site, not to another site (404), nor to a crew member (403), nor without a session (401)', async () => {
    const { site, other, shipment } = await shipmentWithPhoto(await makeJpeg());
    const url = shipment.photos[0].thumbUrl;
    expect((await (await signInAs(['storage'], [site])).agent.get(url)).status).to.equal(200);
    expect((await (await signInAs(['storage'], [other])).agent.get(url)).status).to.equal(404);
    expect((await (await signInAs(['crew'])).agent.get(url)).status).to.equal(403);
    const { default: request } = await import('supertest');
    const { testApp } = await import('../../support/test-app.js');
    expect((await request(testApp()).get(url)).status).to.equal(401);
  });

  it('adds photos to a recorded shipment later; a bad one among them adds none', async () => {
    const { clerk, shipment } = await shipmentWithPhoto(await makeJpeg());
    const bad = await clerk.agent.post(`/api/shipments/${shipment.id}/photos`).set('X-XSRF-TOKEN', clerk.csrf)
      .attach('photos', await makeJpeg(), { filename: 'ok.jpg', contentType: 'image/jpeg' })
      .attach('photos', Buffer.from('%PDF-1.4 not a photo'), { filename: 'scan.jpg', contentType: 'image/jpeg' });
    expect(bad.status).to.equal(400);
    expect((await receivingCounts()).shipment_photos).to.equal(1);
    expect((await receivingCounts()).photoFiles).to.equal(2);
    const good = await clerk.agent.post(`/api/shipments/${shipment.id}/photos`).set('X-XSRF-TOKEN', clerk.csrf)
      .attach('photos', await makeJpeg(), { filename: 'later.jpg', contentType: 'image/jpeg' });
    expect(good.status, JSON.stringify(good.body)).to.equal(200);
    expect(good.body.photos).to.have.length(2);
  });
});
