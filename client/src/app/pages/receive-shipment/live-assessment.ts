// The shared assessment run on the form as it is filled in, so the clerk sees findings and holds before sending.
import { assessShipment, type ProductRangeInfo, type ShipmentAssessment } from '@shared/receiving/assess-shipment.js';
import { readExpiry } from '@shared/receiving/expiry-input.js';
import type { ShipmentOutcome } from '@shared/receiving/arrival-checks.js';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import { siteInstant, type ShipmentFormValue } from './shipment-form';

export function rangesOf(products: ProductView[]): Map<number, ProductRangeInfo> {
  const ranges = new Map<number, ProductRangeInfo>();
  for (const product of products) {
    for (const presentation of product.presentations) {
      ranges.set(presentation.id, { productName: product.name, range: { low: product.storageLow, high: product.storageHigh, unit: product.storageUnit } });
    }
  }
  return ranges;
}

/** `timeZone`: the site's, whose clock the form's times are typed on. */
export function liveAssessment(value: ShipmentFormValue, products: ProductView[], storeWithinMinutes: number, outcome: ShipmentOutcome, timeZone: string): ShipmentAssessment {
  const instant = (wall: string) => siteInstant(wall, timeZone);
  const arrivedAt = instant(value.arrivedAt) ?? new Date().toISOString();
  return assessShipment(
    {
      arrivedAt,
      shippedAt: instant(value.shippedAt),
      // An unanswered check is not a finding yet.
      checks: {
        containerIntact: value.checks.containerIntact ?? true,
        coolantPresent: value.checks.coolantPresent ?? true,
        indicator: value.checks.indicator ?? 'none',
        contentsCold: value.checks.contentsCold ?? true,
      },
      reading: value.readingValue === null ? null : { value: value.readingValue, unit: value.readingUnit },
      outcome,
      lines: value.lines.map((line) => ({
        presentationId: line.presentationId ?? 0,
        lotNumber: line.lotNumber || '(no lot yet)',
        expiry: readExpiry(line.expiry)?.expiry ?? '9999-12-31',
        accepted: line.accepted,
        storedAt: instant(line.storedAt || value.storedAt),
        vialsExpected: line.vialsExpected || 0,
        vialsIntact: line.vialsIntact || 0,
        vialsBroken: line.vialsBroken || 0,
        vialsMissing: line.vialsMissing || 0,
      })),
    },
    rangesOf(products),
    { storeWithinMinutes },
  );
}
