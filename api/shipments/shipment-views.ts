// Loads shipments and shapes them for the API: the full view of one, and summaries for lists.
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { presentationLabel } from '../../shared/catalogue/presentation-label.js';
import type { ShipmentSummary, ShipmentView } from '../../shared/receiving/shipment-view.js';
import { Fridge, Hold, Presentation, Product, PurchaseOrder, Shipment, ShipmentLine, ShipmentPhoto, Site, Supplier, User } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';
import { undecidedHoldsByLot } from '../lots/holds.js';
import { toPhotoView } from '../photos/photos-service.js';
import { assessStoredShipment } from './shipment-assessment.js';

export const shipmentIncludes = [
  { model: Site, as: 'site' },
  { model: Supplier, as: 'supplier' },
  { model: PurchaseOrder, as: 'purchaseOrder', attributes: ['id', 'reference'] },
  { model: User, as: 'receiver', attributes: ['id', 'name'] },
  {
    model: ShipmentLine,
    as: 'lines',
    include: [
      { model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] },
      { model: Fridge, as: 'fridge', attributes: ['id', 'code', 'name'] },
    ],
  },
  { model: ShipmentPhoto, as: 'photos' },
];

export async function siteOfShipment(id: number): Promise<number | null> {
  return (await Shipment.findByPk(id, { attributes: ['siteId'] }))?.siteId ?? null;
}

export async function loadShipment(id: number, transaction?: Transaction): Promise<Shipment> {
  const shipment = await Shipment.findByPk(id, { include: shipmentIncludes, transaction });
  if (!shipment) throw AppError.notFound('No such shipment.');
  return shipment;
}

export async function toShipmentView(shipment: Shipment, transaction?: Transaction): Promise<ShipmentView> {
  const assessment = assessStoredShipment(shipment);
  const lines = [...(shipment.lines ?? [])].sort((a, b) => a.lineNo - b.lineNo);
  const holds = await undecidedHoldsByLot(lines.map((l) => l.lotId).filter((id): id is number => id !== null), transaction);
  const lineViews = lines.map((line) => {
    const presentation = line.presentation!;
    return {
      id: line.id,
      lineNo: line.lineNo,
      presentationId: line.presentationId,
      label: presentationLabel(presentation.product!.name, presentation),
      lotId: line.lotId,
      lotNumber: line.lotNumber,
      expiry: line.expiry,
      expiryDayGiven: line.expiryDayGiven,
      vialsExpected: line.vialsExpected,
      vialsIntact: line.vialsIntact,
      vialsBroken: line.vialsBroken,
      vialsMissing: line.vialsMissing,
      accepted: line.accepted && shipment.outcome !== 'refused',
      vialsStocked: line.lotId === null ? 0 : line.vialsIntact,
      fridgeId: line.fridgeId,
      fridgeName: line.fridge ? `${line.fridge.name} (${line.fridge.code})` : null,
      storedAt: line.storedAt?.toISOString() ?? null,
      notes: line.notes,
      holds: line.lotId === null ? [] : (holds.get(line.lotId) ?? []),
    };
  });
  return {
    ...summaryOf(shipment, assessment.discrepancies.length, new Set(lineViews.filter((l) => l.holds.length).map((l) => l.lotId)).size),
    purchaseOrderId: shipment.purchaseOrderId,
    supplierId: shipment.supplierId,
    trackingNumber: shipment.trackingNumber,
    shippedAt: shipment.shippedAt?.toISOString() ?? null,
    transitHours: assessment.transitHours,
    checks: { containerIntact: shipment.containerIntact, coolantPresent: shipment.coolantPresent, indicator: shipment.indicator, contentsCold: shipment.contentsCold },
    reading: shipment.readingValue === null ? null : { value: shipment.readingValue, unit: shipment.readingUnit!, place: shipment.readingPlace! },
    notes: shipment.notes,
    siteTimeZone: shipment.site!.timeZone,
    lines: lineViews,
    photos: [...(shipment.photos ?? [])].sort((a, b) => a.id - b.id).map(toPhotoView),
    discrepancies: assessment.discrepancies,
    warnings: assessment.warnings,
    reportMailedAt: shipment.reportMailedAt?.toISOString() ?? null,
    reportMailedTo: shipment.reportMailedTo,
  };
}

function summaryOf(shipment: Shipment, discrepancyCount: number, lotsOnHold: number): ShipmentSummary {
  return {
    id: shipment.id,
    siteId: shipment.siteId,
    siteName: shipment.site!.name,
    supplierName: shipment.supplier?.name ?? null,
    purchaseOrderReference: shipment.purchaseOrder?.reference ?? null,
    carrier: shipment.carrier,
    arrivedAt: shipment.arrivedAt.toISOString(),
    outcome: shipment.outcome,
    lineCount: shipment.lines?.length ?? 0,
    photoCount: shipment.photos?.length ?? 0,
    discrepancyCount,
    lotsOnHold,
    receivedBy: shipment.receiver?.name ?? '',
  };
}

export async function loadShipmentView(id: number, transaction?: Transaction): Promise<ShipmentView> {
  return toShipmentView(await loadShipment(id, transaction), transaction);
}

export async function listShipments(user: Express.User, query: { siteId?: number; limit: number }): Promise<ShipmentSummary[]> {
  const where: WhereOptions = query.siteId !== undefined
    ? { siteId: user.allSites || user.siteIds.includes(query.siteId) ? query.siteId : -1 }
    : user.allSites ? {} : { siteId: { [Op.in]: user.siteIds } };
  const shipments = await Shipment.findAll({ where, order: [['arrivedAt', 'DESC'], ['id', 'DESC']], limit: query.limit, include: shipmentIncludes });
  const lotIds = shipments.flatMap((s) => (s.lines ?? []).map((l) => l.lotId)).filter((id): id is number => id !== null);
  const held = new Set((await Hold.findAll({ where: { lotId: lotIds }, attributes: ['lotId'] })).map((h) => h.lotId));
  return shipments.map((shipment) => {
    const heldLots = new Set((shipment.lines ?? []).map((l) => l.lotId).filter((id): id is number => id !== null && held.has(id)));
    return summaryOf(shipment, assessStoredShipment(shipment).discrepancies.length, heldLots.size);
  });
}
