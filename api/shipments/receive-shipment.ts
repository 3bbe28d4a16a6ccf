// Records a shipment in one transaction: lines, lots, receive movements, arrival holds, photos, the order's status, the audit.
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { Fridge, Presentation, Product, PurchaseOrder, Shipment, ShipmentLine, ShipmentPhoto, Site, Supplier } from '../../database/models/index.js';
import { assessShipment, lineTakesStock, type ProductRangeInfo, type ShipmentAssessment } from '../../shared/receiving/assess-shipment.js';
import type { ShipmentInput } from '../../shared/receiving/shipment-input-schema.js';
import type { ShipmentView } from '../../shared/receiving/shipment-view.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { findOrCreateLot } from '../lots/find-or-create-lot.js';
import { openHold } from '../lots/holds.js';
import { postMovement } from '../lots/stock-ledger.js';
import type { ProcessedPhoto } from '../photos/process-photo.js';
import { PhotoStore, type StoredPhoto } from '../photos/photo-store.js';
import { mailDiscrepancyReport } from './report-mail.js';
import { loadShipmentView } from './shipment-views.js';

interface Prepared {
  site: Site;
  assessment: ShipmentAssessment;
  supplierId: number | null;
}

async function prepare(siteId: number, input: ShipmentInput): Promise<Prepared> {
  const site = await Site.findByPk(siteId);
  if (!site) throw AppError.notFound('No such site.');
  const presentationIds = [...new Set(input.lines.map((l) => l.presentationId))];
  const presentations = await Presentation.findAll({ where: { id: presentationIds }, include: [{ model: Product, as: 'product' }] });
  const products = new Map<number, ProductRangeInfo>(
    presentations.map((p) => [p.id, { productName: p.product!.name, range: { low: p.product!.storageLow, high: p.product!.storageHigh, unit: p.product!.storageUnit } }]),
  );
  const fridgeIds = new Set((await Fridge.findAll({ where: { siteId }, attributes: ['id'] })).map((f) => f.id));
  const fields = input.lines.flatMap((line, index) => [
    ...(products.has(line.presentationId) ? [] : [{ field: `lines.${index}.presentationId`, message: 'Unknown presentation.' }]),
    ...(line.fridgeId === null || fridgeIds.has(line.fridgeId) ? [] : [{ field: `lines.${index}.fridgeId`, message: 'Not a fridge of this site.' }]),
  ]);
  let supplierId = input.supplierId;
  if (input.purchaseOrderId !== null) {
    const order = await PurchaseOrder.findByPk(input.purchaseOrderId);
    if (!order || order.siteId !== siteId) fields.push({ field: 'purchaseOrderId', message: 'Not an order for this site.' });
    else supplierId ??= order.supplierId;
  }
  if (input.supplierId !== null && !(await Supplier.findByPk(input.supplierId))) fields.push({ field: 'supplierId', message: 'Unknown supplier.' });
  if (fields.length) throw AppError.badRequest(`The shipment is not valid: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, fields);

  const settings = siteSettingsSchema.parse(site.settings ?? {});
  const assessment = assessShipment(
    { ...input, lines: input.lines.map((line) => ({ ...line, expiry: line.expiry.expiry })) },
    products,
    { storeWithinMinutes: settings.storeWithinMinutes },
  );
  if (assessment.outcomeProblem) throw AppError.badRequest(assessment.outcomeProblem, [{ field: 'outcome', message: assessment.outcomeProblem }]);
  return { site, assessment, supplierId };
}

async function claimOrder(orderId: number | null, outcome: ShipmentInput['outcome'], transaction: Transaction): Promise<void> {
  if (orderId === null) return;
  const order = await PurchaseOrder.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!order || order.status !== 'open') {
    throw AppError.conflict(`Order ${order?.reference ?? orderId} is ${order?.status ?? 'gone'}: receive this delivery as unannounced.`, [
      { field: 'purchaseOrderId', message: 'No longer open.' },
    ]);
  }
  // A refused delivery leaves the order open: the supplier still owes it.
  if (outcome !== 'refused') await order.update({ status: 'received' }, { transaction });
}

async function writeShipment(actorId: number, siteId: number, input: ShipmentInput, prepared: Prepared, photos: StoredPhoto[], transaction: Transaction): Promise<number> {
  await claimOrder(input.purchaseOrderId, input.outcome, transaction);
  const shipment = await Shipment.create(
    {
      siteId,
      purchaseOrderId: input.purchaseOrderId,
      supplierId: prepared.supplierId,
      clientKey: input.clientKey,
      carrier: input.carrier,
      trackingNumber: input.trackingNumber,
      arrivedAt: new Date(input.arrivedAt),
      shippedAt: input.shippedAt ? new Date(input.shippedAt) : null,
      ...input.checks,
      readingValue: input.reading?.value ?? null,
      readingUnit: input.reading?.unit ?? null,
      readingPlace: input.reading?.place ?? null,
      outcome: input.outcome,
      notes: input.notes,
      receivedBy: actorId,
      reportMailedAt: null,
    },
    { transaction },
  );
  const now = new Date();
  for (const [index, line] of input.lines.entries()) {
    const takesStock = lineTakesStock(input.outcome, line);
    const lot = takesStock
      ? await findOrCreateLot({ presentationId: line.presentationId, lotNumber: line.lotNumber, expiry: line.expiry.expiry, expiryDayGiven: line.expiry.dayGiven }, actorId, transaction, `lines.${index}.expiry`)
      : null;
    const storedAt = line.storedAt ? new Date(line.storedAt) : takesStock ? now : null;
    const row = await ShipmentLine.create(
      {
        shipmentId: shipment.id,
        lineNo: index + 1,
        presentationId: line.presentationId,
        lotId: lot?.id ?? null,
        scan: line.scan,
        lotNumber: line.lotNumber,
        expiry: line.expiry.expiry,
        expiryDayGiven: line.expiry.dayGiven,
        vialsExpected: line.vialsExpected,
        vialsIntact: line.vialsIntact,
        vialsBroken: line.vialsBroken,
        vialsMissing: line.vialsMissing,
        accepted: input.outcome !== 'refused' && line.accepted,
        fridgeId: line.fridgeId,
        storedAt,
        notes: line.notes,
      },
      { transaction },
    );
    if (!lot) continue;
    await postMovement(
      { lotId: lot.id, kind: 'receive', vials: line.vialsIntact, toFridgeId: line.fridgeId, at: storedAt!, sourceKind: 'shipment_line', sourceId: row.id, recordedBy: actorId },
      transaction,
    );
    const hold = prepared.assessment.arrivalHolds.find((h) => h.line === index);
    if (hold) {
      await openHold({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: shipment.id, reason: hold.reasons.join(' '), openedBy: actorId }, transaction);
    }
  }
  await ShipmentPhoto.bulkCreate(
    photos.map((p) => ({ shipmentId: shipment.id, fileKey: p.fileKey, width: p.width, height: p.height, bytes: p.display.length, originalName: p.originalName, uploadedBy: actorId })),
    { transaction },
  );
  await recordAudit(
    { actorId, action: 'shipment.receive', entity: 'shipment', entityId: shipment.id, after: { ...input, photos: photos.map((p) => p.fileKey), findings: prepared.assessment.discrepancies.map((d) => d.kind) } },
    transaction,
  );
  return shipment.id;
}

async function existingFor(clientKey: string, siteId: number): Promise<Shipment | null> {
  const existing = await Shipment.findOne({ where: { clientKey }, attributes: ['id', 'siteId'] });
  if (existing && existing.siteId !== siteId) {
    throw AppError.conflict('This draft was already recorded for another site.', [{ field: 'clientKey', message: 'Already used.' }]);
  }
  return existing;
}

/**
 * Receives a shipment; the same draft sent twice (a retry after a lost connection) answers with the first
 * record and `created: false`. A discrepancy report is mailed after the commit.
 */
export async function receiveShipment(
  context: AppContext,
  actorId: number,
  siteId: number,
  input: ShipmentInput,
  photos: ProcessedPhoto[],
): Promise<{ view: ShipmentView; created: boolean }> {
  const earlier = await existingFor(input.clientKey, siteId);
  if (earlier) return { view: await loadShipmentView(earlier.id), created: false };
  const prepared = await prepare(siteId, input);
  const store = new PhotoStore(context.config.UPLOADS_DIR);
  let shipmentId: number;
  try {
    shipmentId = await store.withFiles(photos, (stored) => context.sequelize.transaction((transaction) => writeShipment(actorId, siteId, input, prepared, stored, transaction)));
  } catch (error) {
    const raced = error instanceof UniqueConstraintError && (await existingFor(input.clientKey, siteId));
    if (raced) return { view: await loadShipmentView(raced.id), created: false };
    throw error;
  }
  if (prepared.assessment.needsReport) await mailDiscrepancyReport(context, shipmentId);
  return { view: await loadShipmentView(shipmentId), created: true };
}
