// One product's outlook at a site: usable, held and incoming doses, the need, the shortfall, safety stock and the lowest level ahead.
import { safetyStockDoses } from '../inventory/safety-stock.js';
import type { IsoDate } from '../planning/iso-date.js';
import type { ProductOutlook, ProductPlanning, ProjectedVaccination, ProjectionInput } from './projection-types.js';
import { belowSafetyFrom, lowestLevel, stockLevels } from './stock-levels.js';

export function productOutlook(
  productId: number,
  input: ProjectionInput,
  vaccinations: readonly ProjectedVaccination[],
  horizonEnd: IsoDate,
  planning: ProductPlanning | undefined,
  productName: string,
): ProductOutlook {
  const { today } = input;
  const lots = input.lots.filter((lot) => lot.productId === productId);
  const own = vaccinations.filter((v) => v.productId === productId);
  const dosesOf = (filter: (lot: (typeof lots)[number]) => boolean) => lots.filter(filter).reduce((sum, lot) => sum + lot.vials * lot.dosesPerVial, 0);
  const dosesNeeded = own.reduce((sum, v) => sum + v.dosesNeeded, 0);
  const safety = planning?.safetyStock ?? { kind: 'doses', doses: 0 };
  const safetyDoses =
    safety.kind === 'doses'
      ? safetyStockDoses({ kind: 'doses', doses: safety.doses })
      : safetyStockDoses({ kind: 'daysOfCover', days: safety.days, averageDailyDoses: dosesNeeded / input.horizonDays });
  const points = stockLevels({
    today,
    horizonEnd,
    lots,
    takings: own.flatMap((v) => v.allocations.map((a) => ({ date: v.overdue ? today : v.plannedDate, lot: a.lot, vials: a.vials }))),
  });
  const lowest = lowestLevel(points);
  return {
    productId,
    productName,
    dosesOnHand: dosesOf((lot) => lot.source === 'stock' && lot.status === 'usable' && lot.expiry >= today),
    dosesOnHold: dosesOf((lot) => lot.source === 'stock' && lot.status === 'hold'),
    dosesIncoming: dosesOf((lot) => lot.source !== 'stock'),
    dosesNeeded,
    shortfallDoses: own.reduce((sum, v) => sum + v.shortfallDoses, 0),
    safetyStockDoses: safetyDoses,
    lowestDoses: lowest.doses,
    lowestOn: lowest.date,
    firstShortfallDate: own.find((v) => v.shortfallDoses > 0)?.plannedDate ?? null,
    belowSafetyFrom: safetyDoses > 0 ? belowSafetyFrom(points, safetyDoses) : null,
  };
}
