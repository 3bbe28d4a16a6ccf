// Lot alerts of a site projection: stock on hand expiring within the alert windows, and lots the plan leaves to expire unused.
import type { IsoDate } from '../planning/iso-date.js';
import type { LotLeft } from '../planning/plan-types.js';
import { daysUntilExpiry, expiryWindow, stockValue } from './expiry-alerts.js';
import type { ExpireUnusedAlert, ExpiringAlert, ProjectionInput } from './projection-types.js';

const byExpiry = <T extends { expiry: IsoDate; lotId: number }>(a: T, b: T) => a.expiry.localeCompare(b.expiry) || a.lotId - b.lotId;

/** On-hand lots (held ones too: they are stock all the same) in the smallest window their expiry falls in; 0 when expired. */
export function expiringAlerts(input: ProjectionInput, productName: (id: number) => string): ExpiringAlert[] {
  const prices = new Map(input.presentations.map((p) => [p.id, p.unitPrice]));
  return input.lots
    .flatMap((lot): ExpiringAlert[] => {
      if (lot.source !== 'stock' || lot.vials === 0 || lot.lotId === null) return [];
      const daysLeft = daysUntilExpiry(input.today, lot.expiry);
      const window = expiryWindow(daysLeft, input.expiryAlertDays);
      if (window === null) return [];
      return [{
        lotId: lot.lotId,
        lotNumber: lot.label,
        productId: lot.productId,
        productName: productName(lot.productId),
        presentationId: lot.presentationId,
        expiry: lot.expiry,
        daysLeft,
        window,
        vials: lot.vials,
        doses: lot.vials * lot.dosesPerVial,
        value: stockValue(lot.vials, prices.get(lot.presentationId) ?? null),
        onHold: lot.status === 'hold',
      }];
    })
    .sort(byExpiry);
}

/**
 * Usable lots still holding vials after the plan and expiring inside the horizon: those vials are lost.
 * `stranded` are the planner's lots whose product is needed again after they expire.
 */
export function expireUnusedAlerts(
  input: ProjectionInput,
  lotsLeft: readonly LotLeft[],
  stranded: ReadonlySet<number | string>,
  horizonEnd: IsoDate,
  productName: (id: number) => string,
): ExpireUnusedAlert[] {
  const vialsLeft = new Map(lotsLeft.map((left) => [left.id, left.vials]));
  const prices = new Map(input.presentations.map((p) => [p.id, p.unitPrice]));
  return input.lots
    .flatMap((lot): ExpireUnusedAlert[] => {
      const left = vialsLeft.get(lot.id) ?? 0;
      if (lot.source === 'order' || lot.lotId === null || lot.status !== 'usable' || left === 0 || lot.expiry < input.today || lot.expiry > horizonEnd) return [];
      return [{
        lotId: lot.lotId,
        lotNumber: lot.label,
        productId: lot.productId,
        productName: productName(lot.productId),
        presentationId: lot.presentationId,
        expiry: lot.expiry,
        vials: left,
        doses: left * lot.dosesPerVial,
        valueLost: stockValue(left, prices.get(lot.presentationId) ?? null),
        neededAfterExpiry: stranded.has(lot.id),
      }];
    })
    .sort(byExpiry);
}
