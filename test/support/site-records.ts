// Records on a given site for the role matrix: a route naming a record by id is tried against a real record of that site.
import { randomUUID } from 'node:crypto';
import { Hold, Shipment, ShipmentPhoto, Site, User } from '../../database/models/index.js';
import { PhotoStore } from '../../api/photos/photo-store.js';
import { processPhoto } from '../../api/photos/process-photo.js';
import { createCatalogue, createPurchaseOrder, makeJpeg } from './receiving-fixtures.js';
import { testConfig } from './test-app.js';
import { fridgeRecordMakers } from './fridge-records.js';
import { flockRecordMakers } from './flock-records.js';
import { vaccinationDayRecordMakers } from './vaccination-day-records.js';
import { holdEventRecordMakers } from './hold-event-records.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from './flock-fixtures.js';

type RecordMaker = (siteId: number) => Promise<number>;

async function anyUserId(): Promise<number> {
  const user = (await User.findOne()) ?? (await User.create({ email: `maker-${randomUUID().slice(0, 6)}@test.example`, name: 'Record maker', roles: ['admin'], passwordHash: 'x' }));
  return user.id;
}

async function makeShipment(siteId: number): Promise<number> {
  // A warm arrival, so the shipment has a discrepancy report to read.
  const shipment = await Shipment.create({
    siteId, purchaseOrderId: null, supplierId: null, clientKey: randomUUID(), arrivedAt: new Date(), shippedAt: null,
    containerIntact: true, coolantPresent: true, indicator: 'none', contentsCold: false,
    readingValue: null, readingUnit: null, readingPlace: null, outcome: 'accepted_with_discrepancies', receivedBy: await anyUserId(), reportMailedAt: null,
  });
  return shipment.id;
}

async function makePhoto(siteId: number): Promise<number> {
  const shipmentId = await makeShipment(siteId);
  const [stored] = await new PhotoStore(testConfig().UPLOADS_DIR).write([await processPhoto({ buffer: await makeJpeg(64, 48), originalname: 'box.jpg' }, 0)]);
  const photo = await ShipmentPhoto.create({ shipmentId, fileKey: stored!.fileKey, width: stored!.width, height: stored!.height, bytes: stored!.display.length, uploadedBy: null });
  return photo.id;
}

async function makePurchaseOrder(siteId: number): Promise<number> {
  return (await createPurchaseOrder((await Site.findByPk(siteId))!, await createCatalogue())).id;
}

/** A held lot received into a fridge of the site (its site for access is where it was first received). */
async function makeReceivedLot(siteId: number): Promise<number> {
  const site = (await Site.findByPk(siteId))!;
  const product = await createProduct();
  const presentation = await createPresentation(product, 1000);
  const lot = await stockLot(await createSiteFridge(site), presentation, 10, '2030-01-31');
  // Held, so routes about held lots (the do-not-use tag) have something to show for their own site.
  await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'test-lot', sourceId: lot.id, reason: 'test hold', openedBy: null });
  return lot.id;
}

/** An arrival hold on a lot received at the site. */
async function makeHold(siteId: number): Promise<number> {
  const lotId = await makeReceivedLot(siteId);
  return (await Hold.create({ lotId, cause: 'arrival', sourceKind: 'test', sourceId: lotId, reason: 'test hold', openedBy: null })).id;
}

/** Route parameters that name a site-scoped record, each with a maker of such a record on a given site. */
export const siteRecordMakers: Record<string, RecordMaker> = {
  shipmentId: makeShipment,
  photoId: makePhoto,
  purchaseOrderId: makePurchaseOrder,
  lotId: makeReceivedLot,
  holdId: makeHold,
  ...fridgeRecordMakers,
  ...flockRecordMakers,
  ...vaccinationDayRecordMakers,
  ...holdEventRecordMakers,
};

/** The route's path for a site: :siteId becomes the site, a known record parameter a record made on it, any other 1. */
export async function siteRecordPath(path: string, siteId: number): Promise<string> {
  let concrete = path.replace(':siteId', String(siteId));
  for (const [param, make] of Object.entries(siteRecordMakers)) {
    if (concrete.includes(`:${param}`)) concrete = concrete.replace(`:${param}`, String(await make(siteId)));
  }
  return concrete.replace(/:[A-Za-z]+/g, '1');
}
