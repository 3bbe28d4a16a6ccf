// Test data for receiving: a catalogue, fridges, orders, real images made with sharp, and a shipment payload builder.
import { randomUUID } from 'node:crypto';
import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';
import { gtinCheckDigit } from '../../shared/barcode/index.js';
import type { Site } from '../../database/models/index.js';
import { Fridge, Presentation, Product, PurchaseOrder, PurchaseOrderLine, Supplier } from '../../database/models/index.js';
import type { SignedIn } from './test-app.js';

/** A valid GTIN-14 from a 13-digit body (check digit computed with the GS1 rule). */
export function gtin(body13: string): string {
  return body13 + String(gtinCheckDigit(body13));
}

export async function createFridge(site: Site, code = `${site.code}-F${Math.floor(Math.random() * 900 + 100)}`): Promise<Fridge> {
  return Fridge.create({ siteId: site.id, code, name: `Fridge ${code}`, place: 'Test room' });
}

export interface CatalogueFixture {
  supplier: Supplier;
  product: Product;
  presentation: Presentation;
}

/** A supplier and a live spray product stored at 35–45 °F (the common label range) with one 10-vial presentation. */
export async function createCatalogue(options: { name?: string; packGtin?: string; low?: number; high?: number; unit?: 'F' | 'C'; supplierEmail?: string } = {}): Promise<CatalogueFixture> {
  const supplier = await Supplier.create({ name: `Supplier ${randomUUID().slice(0, 6)}`, orderEmail: options.supplierEmail ?? `orders-${randomUUID().slice(0, 6)}@supplier.example`, leadTimeDays: 5 });
  const product = await Product.create({
    name: options.name ?? `Test spray vaccine ${randomUUID().slice(0, 4)}`,
    kind: 'live',
    route: 'spray',
    storageLow: options.low ?? 35,
    storageHigh: options.high ?? 45,
    storageUnit: options.unit ?? 'F',
    useWithinMinutes: 120,
  });
  const presentation = await Presentation.create({
    productId: product.id,
    dosesPerVial: 1000,
    vialsPerPack: 10,
    packGtin: options.packGtin ?? gtin(`0${String(Math.floor(Math.random() * 1e12)).padStart(12, '0')}`),
    vialGtin: null,
    unitPrice: 42.5,
    proposedBy: null,
    proposedAt: null,
  });
  return { supplier, product, presentation };
}

export async function createPurchaseOrder(site: Site, catalogue: CatalogueFixture, options: { expectedDate?: string; packs?: number } = {}): Promise<PurchaseOrder> {
  const order = await PurchaseOrder.create({
    siteId: site.id,
    supplierId: catalogue.supplier.id,
    reference: `PO-${randomUUID().slice(0, 8)}`,
    expectedDate: options.expectedDate ?? new Date().toISOString().slice(0, 10),
    carrier: 'Test Courier',
    createdBy: null,
  });
  await PurchaseOrderLine.create({ purchaseOrderId: order.id, lineNo: 1, presentationId: catalogue.presentation.id, packs: options.packs ?? 2 });
  return order;
}

/** A real JPEG with busy content (so its bytes are not trivially small), optionally with EXIF orientation and GPS. */
export async function makeJpeg(width = 640, height = 480, exif?: { orientation?: number; gps?: boolean }): Promise<Buffer> {
  const noise = Buffer.alloc(width * height * 3);
  for (let i = 0; i < noise.length; i++) noise[i] = (i * 31 + Math.floor(i / width) * 7) % 256;
  let image = sharp(noise, { raw: { width, height, channels: 3 } }).jpeg({ quality: 80 });
  if (exif) {
    // IFD3 is the GPS block; the orientation goes last, as sharp sets it apart from the other tags.
    image = image.withExif({ IFD0: { Make: 'TestCam' }, ...(exif.gps && { IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '41/1 52/1 0/1' } }) });
    if (exif.orientation) image = image.withMetadata({ orientation: exif.orientation });
  }
  return image.toBuffer();
}

/** A tiny PNG whose header claims width × height pixels: a decompression bomb in a few hundred bytes. */
export function pngClaiming(width: number, height: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(Buffer.alloc(1024))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

export interface LineOptions {
  presentationId: number;
  fridgeId: number | null;
  lotNumber?: string;
  expiry?: string;
  expected?: number;
  intact?: number;
  broken?: number;
  missing?: number;
  accepted?: boolean;
}

export function lineInput(options: LineOptions) {
  const expected = options.expected ?? 20;
  return {
    presentationId: options.presentationId,
    scan: '',
    lotNumber: options.lotNumber ?? `L${randomUUID().slice(0, 6).toUpperCase()}`,
    expiry: options.expiry ?? '2028-03',
    vialsExpected: expected,
    vialsIntact: options.intact ?? expected - (options.broken ?? 0) - (options.missing ?? 0),
    vialsBroken: options.broken ?? 0,
    vialsMissing: options.missing ?? 0,
    accepted: options.accepted ?? true,
    fridgeId: options.fridgeId,
    storedAt: null as string | null,
    notes: '',
  };
}

/** A shipment that arrived ten minutes ago with every check fine and a 40 °F probe reading. */
export function shipmentInput(lines: ReturnType<typeof lineInput>[], overrides: Record<string, unknown> = {}) {
  return {
    clientKey: randomUUID(),
    purchaseOrderId: null,
    supplierId: null,
    carrier: 'Test Courier',
    trackingNumber: '1Z-TEST',
    arrivedAt: new Date(Date.now() - 10 * 60_000).toISOString(),
    shippedAt: new Date(Date.now() - 20 * 3_600_000).toISOString(),
    checks: { containerIntact: true, coolantPresent: true, indicator: 'not_triggered', contentsCold: true },
    reading: { value: 40, unit: 'F', place: 'probe' },
    outcome: 'accepted',
    notes: '',
    lines,
    ...overrides,
  };
}

export interface PhotoPart {
  content: Buffer;
  name: string;
  type?: string;
}

/** Posts a shipment as the form does: multipart with the JSON in "shipment" and the photos in "photos". */
export function postShipment(signedIn: SignedIn, siteId: number, shipment: unknown, photos: PhotoPart[] = []) {
  let call = signedIn.agent.post(`/api/shipments/sites/${siteId}`).set('X-XSRF-TOKEN', signedIn.csrf).field('shipment', JSON.stringify(shipment));
  for (const photo of photos) call = call.attach('photos', photo.content, { filename: photo.name, contentType: photo.type ?? 'image/jpeg' });
  return call;
}
