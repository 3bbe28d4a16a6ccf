// Invented receiving data for the demo: suppliers, products and packs, open orders, and two shipments already received.
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { gtinCheckDigit } from '../../shared/barcode/index.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { siteTime } from './demo-clock.js';
import { noticeHoldOpened } from './demo-hold-notice.js';
import {
  Fridge, Hold, Lot, Presentation, Product, PurchaseOrder, PurchaseOrderLine, Shipment, ShipmentLine, Site, StockMovement, Supplier, User,
} from '../models/index.js';

/** GTINs under GS1's own example prefix 0950600, so no real company's number is used. */
function demoGtin(item: string): string {
  const body = `0950600${item.padStart(6, '0')}`;
  return body + String(gtinCheckDigit(body));
}

const products = [
  {
    name: 'Meadowline ND spray', maker: 'Hollowbrook Biologics', kind: 'live', route: 'spray', useWithinMinutes: 120,
    packs: [{ doses: 1000, item: '110010' }, { doses: 5000, item: '110050' }],
  },
  {
    name: 'Fernhollow IB drinking-water vaccine', maker: 'Hollowbrook Biologics', kind: 'live', route: 'drinking_water', useWithinMinutes: 120,
    packs: [{ doses: 2500, item: '120025' }, { doses: 10000, item: '120100' }],
  },
  { name: 'Tallgrass AE wing-web vaccine', maker: 'Quillmark Animal Health', kind: 'live', route: 'wing_web', useWithinMinutes: 60, packs: [{ doses: 1000, item: '130010' }] },
  {
    name: 'Cinderfield ND-IB emulsion', maker: 'Quillmark Animal Health', kind: 'inactivated', route: 'injection', useWithinMinutes: null, celsius: true,
    packs: [{ doses: 1000, item: '140010' }],
  },
] as const;

function daysFrom(date: string, days: number): string {
  return new Date(Date.parse(`${date}T12:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

export async function seedDemoReceiving(transaction: Transaction): Promise<void> {
  const coldline = await Supplier.create({ name: 'Coldline Farm Supply', orderEmail: 'orders@coldline.example', leadTimeDays: 5, notes: 'Ships Monday to Wednesday only.' }, { transaction });
  const prairie = await Supplier.create({ name: 'Prairie Vet Distribution', orderEmail: 'orders@prairievet.example', leadTimeDays: 3 }, { transaction });

  const packs = new Map<string, Presentation>();
  for (const product of products) {
    const row = await Product.create(
      {
        name: product.name, maker: product.maker, kind: product.kind, route: product.route, useWithinMinutes: product.useWithinMinutes,
        timeOutLimitMinutes: product.kind === 'live' ? 30 : 60,
        storageLow: 'celsius' in product ? 2 : 35, storageHigh: 'celsius' in product ? 8 : 45, storageUnit: 'celsius' in product ? 'C' : 'F',
        freezeSensitive: true, withdrawalDays: 21, proposedBy: null,
      },
      { transaction },
    );
    for (const pack of product.packs) {
      const presentation = await Presentation.create(
        { productId: row.id, dosesPerVial: pack.doses, vialsPerPack: 10, packGtin: demoGtin(pack.item), vialGtin: null, unitPrice: pack.doses / 40, proposedBy: null, proposedAt: null },
        { transaction },
      );
      packs.set(pack.item, presentation);
    }
  }

  const north = (await Site.findOne({ where: { code: 'LKN' }, transaction }))!;
  const fennel = (await Site.findOne({ where: { code: 'FCP' }, transaction }))!;
  const fridge = async (code: string) => (await Fridge.findOne({ where: { code }, transaction }))!;
  const clerk = (await User.findOne({ where: { email: 'receiving@larkmoor.example' }, transaction }))!;
  const buyer = (await User.findOne({ where: { email: 'purchasing@larkmoor.example' }, transaction }))!;
  const admin = (await User.findOne({ where: { email: 'admin@larkmoor.example' }, transaction }))!;
  const today = siteLocalDate(new Date(), north.timeZone);

  const order = async (site: Site, supplier: Supplier, reference: string, expectedDate: string, lines: [string, number][], extra: Partial<PurchaseOrder> = {}) => {
    const row = await PurchaseOrder.create({ siteId: site.id, supplierId: supplier.id, reference, expectedDate, carrier: 'Frostway Courier', trackingNumber: `FW${reference.slice(3)}0417`, createdBy: buyer.id, ...extra }, { transaction });
    for (const [index, [item, count]] of lines.entries()) {
      await PurchaseOrderLine.create({ purchaseOrderId: row.id, lineNo: index + 1, presentationId: packs.get(item)!.id, packs: count }, { transaction });
    }
    return row;
  };
  await order(north, coldline, 'PO-2611', today, [['110010', 2], ['120025', 1], ['130010', 1]]);
  await order(north, prairie, 'PO-2608', daysFrom(today, -2), [['140010', 1]]);
  await order(fennel, coldline, 'PO-2612', daysFrom(today, 3), [['110050', 1]]);
  const delivered = await order(north, coldline, 'PO-2601', daysFrom(today, -6), [['110010', 2]], { status: 'received' });
  const warmOrder = await order(fennel, prairie, 'PO-2604', daysFrom(today, -3), [['120100', 1]], { status: 'received' });

  // A clean delivery at Larkmoor North six days ago, first thing in the morning (its restock met the vaccine room
  // fridge's warm spell, see demo-fridge-logs.ts).
  const arrived = siteTime(north.timeZone, -6, '07:40');
  const clean = await Shipment.create(
    {
      siteId: north.id, purchaseOrderId: delivered.id, supplierId: coldline.id, clientKey: randomUUID(), carrier: 'Frostway Courier', trackingNumber: 'FW26010417',
      arrivedAt: arrived, shippedAt: new Date(arrived.getTime() - 22 * 3_600_000), containerIntact: true, coolantPresent: true, indicator: 'not_triggered', contentsCold: true,
      readingValue: 39.5, readingUnit: 'F', readingPlace: 'probe', outcome: 'accepted', receivedBy: clerk.id, reportMailedAt: null,
    },
    { transaction },
  );
  const roomFridge = await fridge('LKN-F1');
  const storedAt = new Date(arrived.getTime() + 12 * 60_000);
  const ndLot = await Lot.create({ presentationId: packs.get('110010')!.id, lotNumber: 'MND4471', expiry: '2027-09-30', expiryDayGiven: false, createdBy: clerk.id }, { transaction });
  const cleanLine = await ShipmentLine.create(
    { shipmentId: clean.id, lineNo: 1, presentationId: ndLot.presentationId, lotId: ndLot.id, lotNumber: 'MND4471', expiry: '2027-09-30', expiryDayGiven: false, vialsExpected: 20, vialsIntact: 20, vialsBroken: 0, vialsMissing: 0, accepted: true, fridgeId: roomFridge.id, storedAt },
    { transaction },
  );
  await StockMovement.create({ lotId: ndLot.id, kind: 'receive', vials: 20, toFridgeId: roomFridge.id, fromFridgeId: null, leftAt: null, at: storedAt, sourceKind: 'shipment_line', sourceId: cleanLine.id, recordedBy: clerk.id }, { transaction });

  // A warm delivery at Fennel Creek three days ago, late in the morning: one vial broken, the lot held on arrival.
  const warmArrived = siteTime(fennel.timeZone, -3, '11:20');
  const warm = await Shipment.create(
    {
      siteId: fennel.id, purchaseOrderId: warmOrder.id, supplierId: prairie.id, clientKey: randomUUID(), carrier: 'Frostway Courier', trackingNumber: 'FW26040417',
      arrivedAt: warmArrived, shippedAt: new Date(warmArrived.getTime() - 30 * 3_600_000), containerIntact: true, coolantPresent: false, indicator: 'none', contentsCold: true,
      readingValue: 49, readingUnit: 'F', readingPlace: 'product_surface', outcome: 'accepted_with_discrepancies', receivedBy: admin.id, reportMailedAt: null,
      notes: 'Gel packs were soft; box sat on the dock in the sun.',
    },
    { transaction },
  );
  const brooder = await fridge('FCP-F1');
  const warmStored = new Date(warmArrived.getTime() + 25 * 60_000);
  const ibLot = await Lot.create({ presentationId: packs.get('120100')!.id, lotNumber: 'FIB0932', expiry: '2027-06-15', expiryDayGiven: true, createdBy: admin.id }, { transaction });
  const warmLine = await ShipmentLine.create(
    { shipmentId: warm.id, lineNo: 1, presentationId: ibLot.presentationId, lotId: ibLot.id, lotNumber: 'FIB0932', expiry: '2027-06-15', expiryDayGiven: true, vialsExpected: 10, vialsIntact: 9, vialsBroken: 1, vialsMissing: 0, accepted: true, fridgeId: brooder.id, storedAt: warmStored },
    { transaction },
  );
  await StockMovement.create({ lotId: ibLot.id, kind: 'receive', vials: 9, toFridgeId: brooder.id, fromFridgeId: null, leftAt: null, at: warmStored, sourceKind: 'shipment_line', sourceId: warmLine.id, recordedBy: admin.id }, { transaction });
  // The hold dates from the delivery it was found at, as receiving's own would; the column's default is the seeding time.
  const arrivalHold = {
    lotId: ibLot.id, cause: 'arrival' as const, sourceKind: 'shipment', sourceId: warm.id, reason: "The reading 49 °F is above Fernhollow IB drinking-water vaccine's label range 35–45 °F.",
    openedBy: admin.id, openedAt: warmArrived,
  };
  await Hold.create(arrivalHold, { transaction });
  await noticeHoldOpened(transaction, arrivalHold);
}
