// Bad images at receiving, through a server in its own process: each a clear 4xx naming the photo, no row and no file
// stored (neither with a new shipment nor added to one), the server up and under 512 MB resident; a good photo still goes in.
import { expect } from 'chai';
import sharp from 'sharp';
import request from 'supertest';
import { createTestUser, createSite, testApp } from '../../support/test-app.js';
import { resetDatabase } from '../../support/test-database.js';
import { createCatalogue, createFridge, lineInput, makeJpeg, pngClaiming, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles, receivingCounts } from '../../support/receiving-state.js';
import { RssWatch, signInRemote, type RemoteSession } from '../../support/remote-session.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';

interface BadImage {
  name: string;
  type: string;
  why: string;
  status: 400 | 413;
  message: RegExp;
  content: () => Promise<Buffer>;
}

/** A JPEG with `segments` APP1 blocks of 64 kB each after its start marker: megabytes of "EXIF" around a small picture. */
async function jpegWithHugeExif(segments: number): Promise<Buffer> {
  const jpeg = await makeJpeg(320, 240);
  const block = () => {
    const body = Buffer.concat([Buffer.from('Exif\0\0II*\0\x08\0\0\0', 'latin1'), Buffer.alloc(65_000, 0x41)]);
    const header = Buffer.from([0xff, 0xe1, 0, 0]);
    header.writeUInt16BE(body.length + 2, 2);
    return Buffer.concat([header, body]);
  };
  return Buffer.concat([jpeg.subarray(0, 2), ...Array.from({ length: segments }, block), jpeg.subarray(2)]);
}

async function corruptPng(): Promise<Buffer> {
  const png = Buffer.from(await sharp({ create: { width: 64, height: 64, channels: 3, background: '#3a7' } }).png().toBuffer());
  png[png.length - 20] ^= 0xff; // inside the image data: its checksum no longer matches
  return png;
}

const notReadable = /not an image Vialyard can read/;
const badImages: BadImage[] = [
  { name: 'empty.jpg', type: 'image/jpeg', why: 'zero bytes', status: 400, message: notReadable, content: async () => Buffer.alloc(0) },
  { name: 'truncated.jpg', type: 'image/jpeg', why: 'a JPEG cut in half', status: 400, message: notReadable, content: async () => (await makeJpeg(640, 480)).subarray(0, 20_000) },
  { name: 'bomb.png', type: 'image/png', why: 'a few hundred bytes whose header says 30,000 × 30,000', status: 413, message: /too many pixels/, content: async () => pngClaiming(30_000, 30_000) },
  { name: 'strip.png', type: 'image/png', why: 'a header of 1 × 200,000,000 with no such data', status: 400, message: notReadable, content: async () => pngClaiming(1, 200_000_000) },
  { name: 'zero.png', type: 'image/png', why: 'a header of 0 × 0', status: 400, message: notReadable, content: async () => pngClaiming(0, 0) },
  { name: 'drawing.svg', type: 'image/svg+xml', why: 'an SVG (script-capable, not a photo)', status: 400, message: /not a photo Vialyard keeps/,
    content: async () => Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="200" height="100"><script>alert(1)</script><rect width="200" height="100"/></svg>') },
  { name: 'delivery-note.jpg', type: 'image/jpeg', why: 'a PDF renamed .jpg', status: 400, message: notReadable,
    content: async () => Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n') },
  { name: 'exif.jpg', type: 'image/jpeg', why: 'a small picture with 12 MB of EXIF blocks', status: 400, message: /more than 4 MB of metadata/, content: () => jpegWithHugeExif(190) },
  { name: 'notes.jpg', type: 'image/jpeg', why: 'a text file', status: 400, message: notReadable, content: async () => Buffer.from('Box 3 arrived warm, driver signed at 10:40.\n') },
  { name: 'scan.bmp', type: 'image/bmp', why: 'a BMP header with nothing behind it', status: 400, message: notReadable, content: async () => Buffer.concat([Buffer.from('BM'), Buffer.alloc(200)]) },
  { name: 'damaged.png', type: 'image/png', why: 'a PNG whose image data fails its checksum', status: 400, message: notReadable, content: corruptPng },
];

describe('bad images at receiving, through a separate server process', function () {
  this.timeout(90_000);
  let server: ServerProcess;
  let clerk: RemoteSession;
  let rss: RssWatch;
  let siteId: number;
  let shipmentId: number;
  let line: () => ReturnType<typeof lineInput>;

  const post = (path: string) => request(server.url).post(path).set('Cookie', clerk.cookie).set('X-XSRF-TOKEN', clerk.csrf);

  before(async () => {
    testApp(); // models bind when the test process's context is made
    await resetDatabase();
    clearPhotoFiles();
    const site = await createSite('PHOTO');
    const fridge = await createFridge(site, 'PHOTO-F1');
    const catalogue = await createCatalogue();
    const user = await createTestUser({ roles: ['receiving'], sites: [site] });
    siteId = site.id;
    line = () => lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id });
    server = await startServerProcess(await freePort());
    rss = new RssWatch(server.child.pid!);
    clerk = await signInRemote(server.url, user.email);
    const first = await post(`/api/shipments/sites/${siteId}`).field('shipment', JSON.stringify(shipmentInput([line()])));
    expect(first.status, JSON.stringify(first.body)).to.equal(201);
    shipmentId = first.body.id;
  });
  after(async () => {
    rss?.stop();
    await server?.stop();
  });

  for (const image of badImages) {
    it(`${image.name} (${image.why}): ${image.status}, nothing stored`, async () => {
      const content = await image.content();
      const before = await receivingCounts();
      const added = await post(`/api/shipments/${shipmentId}/photos`).attach('photos', content, { filename: image.name, contentType: image.type });
      const received = await post(`/api/shipments/sites/${siteId}`).field('shipment', JSON.stringify(shipmentInput([line()]))).attach('photos', content, { filename: image.name, contentType: image.type });
      for (const [what, response] of [['added to a shipment', added], ['with a new shipment', received]] as const) {
        expect(response.status, `${what}: ${JSON.stringify(response.body)}`).to.equal(image.status);
        expect(response.body.error.message, what).to.match(new RegExp(`^${image.name.replace('.', '\\.')}: `));
        expect(response.body.error.message, what).to.match(image.message);
        expect(response.body.error.fields, what).to.deep.equal([{ field: 'photos.0', message: response.body.error.message.slice(image.name.length + 2) }]);
      }
      expect(await receivingCounts(), 'no row and no file').to.deep.equal(before);
      expect(server.child.exitCode, 'the server is still running').to.equal(null);
    });
  }

  it('accepts the controls: a JPEG named .png, and a GIF (a format Vialyard keeps), each stored as a JPEG with its thumbnail', async () => {
    const before = await receivingCounts();
    const jpegNamedPng = await post(`/api/shipments/${shipmentId}/photos`).attach('photos', await makeJpeg(800, 600), { filename: 'box.png', contentType: 'image/png' });
    expect(jpegNamedPng.status, JSON.stringify(jpegNamedPng.body)).to.equal(200);
    const gif = await sharp({ create: { width: 120, height: 80, channels: 3, background: '#c60' } }).gif().toBuffer();
    const withGif = await post(`/api/shipments/${shipmentId}/photos`).attach('photos', gif, { filename: 'label.gif', contentType: 'image/gif' });
    expect(withGif.status, JSON.stringify(withGif.body)).to.equal(200);
    const after = await receivingCounts();
    expect(after.shipment_photos).to.equal(before.shipment_photos + 2);
    expect(after.photoFiles).to.equal(before.photoFiles + 4);
    const sizes = withGif.body.photos.map((p: { width: number; height: number }) => `${p.width}×${p.height}`);
    expect(sizes.slice(-2)).to.deep.equal(['800×600', '120×80']);
  });

  it('keeps the server under 512 MB resident through all of it', () => {
    const peak = rss.stop();
    expect(peak, 'RSS was sampled').to.be.above(0);
    console.log(`      peak resident memory of the server: ${(peak / 1024 / 1024).toFixed(1)} MB`);
    expect(peak).to.be.below(512 * 1024 * 1024);
  });
});
