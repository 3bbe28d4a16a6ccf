// Re-reads a stored shipment through the shared assessment, so screens, reports and mail agree on its findings.
import { assessShipment, type ProductRangeInfo, type ShipmentAssessment } from '../../shared/receiving/assess-shipment.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import type { Shipment } from '../../database/models/index.js';

/** Needs the shipment loaded with its site and its lines' presentations and products. */
export function assessStoredShipment(shipment: Shipment): ShipmentAssessment {
  const lines = [...(shipment.lines ?? [])].sort((a, b) => a.lineNo - b.lineNo);
  const products = new Map<number, ProductRangeInfo>();
  for (const line of lines) {
    const product = line.presentation!.product!;
    products.set(line.presentationId, { productName: product.name, range: { low: product.storageLow, high: product.storageHigh, unit: product.storageUnit } });
  }
  const settings = siteSettingsSchema.parse(shipment.site?.settings ?? {});
  return assessShipment(
    {
      arrivedAt: shipment.arrivedAt.toISOString(),
      shippedAt: shipment.shippedAt?.toISOString() ?? null,
      checks: { containerIntact: shipment.containerIntact, coolantPresent: shipment.coolantPresent, indicator: shipment.indicator, contentsCold: shipment.contentsCold },
      reading: shipment.readingValue === null || shipment.readingUnit === null ? null : { value: shipment.readingValue, unit: shipment.readingUnit },
      outcome: shipment.outcome,
      lines: lines.map((line) => ({ ...line.get(), storedAt: line.storedAt?.toISOString() ?? null })),
    },
    products,
    { storeWithinMinutes: settings.storeWithinMinutes },
  );
}
