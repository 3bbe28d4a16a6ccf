// A site's projection over the horizon: the planner's allocation of its stock and arrivals, each product's outlook, the alerts and the reorder suggestions.
import { orderByDate } from '../inventory/order-by-date.js';
import { safetyStockDoses } from '../inventory/safety-stock.js';
import { addDays, type IsoDate } from '../planning/iso-date.js';
import { choosePresentation } from './choose-presentation.js';
import { daysUntilExpiry, expiryWindow, stockValue } from './expiry-alerts.js';
import { planWithArrivals } from './plan-with-arrivals.js';
import type {
  ExpireUnusedAlert,
  ExpiringAlert,
  ProductOutlook,
  ProductPlanning,
  ProjectedVaccination,
  ProjectionInput,
  ReorderSuggestion,
  SiteProjection,
} from './projection-types.js';
import { belowSafetyFrom, lowestLevel, stockLevels } from './stock-levels.js';

export function projectSite(input: ProjectionInput): SiteProjection {
  const { today } = input;
  const horizonEnd = addDays(today, input.horizonDays);
  const planning = new Map(input.products.map((product) => [product.productId, product]));
  const productName = (id: number) => planning.get(id)?.productName ?? `Product ${id}`;
  const lotsById = new Map(input.lots.map((lot) => [lot.id, lot]));
  const presentationsById = new Map(input.presentations.map((p) => [p.id, p]));

  // Overdue vaccinations still need their vials: they are planned as if today.
  const inScope = input.vaccinations.filter((v) => v.plannedDate <= horizonEnd);
  const byId = new Map(inScope.map((v) => [v.id, v]));
  const plan = planWithArrivals({
    lots: input.lots.map((lot) => ({ ...lot, product: String(lot.productId) })),
    vaccinations: inScope.map((v) => ({ id: v.id, product: String(v.productId), date: v.plannedDate < today ? today : v.plannedDate, birds: v.birds })),
    overagePercent: input.overagePercent,
  });

  const vaccinations: ProjectedVaccination[] = plan.vaccinations.map((planned) => {
    const v = byId.get(planned.id as number)!;
    return {
      id: v.id,
      flockId: v.flockId,
      flockName: v.flockName,
      houseName: v.houseName,
      productId: v.productId,
      productName: productName(v.productId),
      plannedDate: v.plannedDate,
      overdue: v.plannedDate < today,
      birds: v.birds,
      dosesNeeded: planned.dosesNeeded,
      allocations: planned.allocations.map((a) => {
        const lot = lotsById.get(a.lot)!;
        return { lot: a.lot, label: lot.label, source: lot.source, vials: a.vials, doses: a.doses };
      }),
      dosesAllocated: planned.dosesAllocated,
      dosesWasted: planned.dosesWasted,
      shortfallDoses: planned.shortfallDoses,
    };
  });

  const vialsLeft = new Map(plan.lotsLeft.map((left) => [left.id, left.vials]));
  const productIds = [...new Set([...input.products.map((p) => p.productId), ...input.lots.map((l) => l.productId), ...inScope.map((v) => v.productId)])];
  const products = productIds.map((id) => outlook(id, input, vaccinations, horizonEnd, planning.get(id), productName(id))).sort(byName);

  const strandedIds = new Set(plan.expiringUnused.map((entry) => entry.lot));
  const expiring: ExpiringAlert[] = input.lots.flatMap((lot) => {
    if (lot.source !== 'stock' || lot.vials === 0 || lot.lotId === null) return [];
    const daysLeft = daysUntilExpiry(today, lot.expiry);
    const window = expiryWindow(daysLeft, input.expiryAlertDays);
    if (window === null) return [];
    const presentation = presentationsById.get(lot.presentationId);
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
      value: stockValue(lot.vials, presentation?.unitPrice ?? null),
      onHold: lot.status === 'hold',
    }];
  });
  const expireUnused: ExpireUnusedAlert[] = input.lots.flatMap((lot) => {
    const left = vialsLeft.get(lot.id) ?? 0;
    if (lot.source === 'order' || lot.lotId === null || lot.status !== 'usable' || left === 0 || lot.expiry < today || lot.expiry > horizonEnd) return [];
    return [{
      lotId: lot.lotId,
      lotNumber: lot.label,
      productId: lot.productId,
      productName: productName(lot.productId),
      presentationId: lot.presentationId,
      expiry: lot.expiry,
      vials: left,
      doses: left * lot.dosesPerVial,
      valueLost: stockValue(left, presentationsById.get(lot.presentationId)?.unitPrice ?? null),
      neededAfterExpiry: strandedIds.has(lot.id),
    }];
  });

  return {
    today,
    horizonEnd,
    vaccinations,
    products,
    alerts: {
      uncovered: vaccinations
        .filter((v) => v.shortfallDoses > 0)
        .map((v) => ({
          vaccinationId: v.id,
          plannedDate: v.plannedDate,
          flockId: v.flockId,
          flockName: v.flockName,
          houseName: v.houseName,
          productId: v.productId,
          productName: v.productName,
          shortfallDoses: v.shortfallDoses,
        })),
      expiring: expiring.sort((a, b) => a.expiry.localeCompare(b.expiry) || a.lotId - b.lotId),
      expireUnused: expireUnused.sort((a, b) => a.expiry.localeCompare(b.expiry) || a.lotId - b.lotId),
      belowSafety: products
        .filter((p) => p.belowSafetyFrom !== null)
        .map((p) => ({ productId: p.productId, productName: p.productName, from: p.belowSafetyFrom!, lowestDoses: p.lowestDoses, safetyStockDoses: p.safetyStockDoses })),
    },
    suggestions: products
      .flatMap((p) => suggest(p, input, vaccinations, planning.get(p.productId)))
      .sort((a, b) => a.orderBy.localeCompare(b.orderBy) || a.productName.localeCompare(b.productName)),
    lotsLeft: plan.lotsLeft,
  };
}

function outlook(
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

function suggest(
  product: ProductOutlook,
  input: ProjectionInput,
  vaccinations: readonly ProjectedVaccination[],
  planning: ProductPlanning | undefined,
): ReorderSuggestion[] {
  const firstShort = vaccinations.find((v) => v.productId === product.productId && v.shortfallDoses > 0);
  const shortDate = firstShort ? (firstShort.overdue ? input.today : firstShort.plannedDate) : null;
  const dates = [shortDate, product.belowSafetyFrom].filter((date): date is IsoDate => date !== null).sort();
  if (!dates.length) return [];
  const shortfalls = vaccinations.filter((v) => v.productId === product.productId && v.shortfallDoses > 0).map((v) => v.shortfallDoses);
  const topUpDoses = Math.max(0, product.safetyStockDoses - product.lowestDoses);
  const candidates = input.presentations.filter((p) => p.productId === product.productId);
  const order = choosePresentation(candidates, planning?.presentationId ?? null, shortfalls, topUpDoses);
  if (!order) return [];
  const supplier = planning?.supplier ?? null;
  const needDate = dates[0]!;
  const orderBy = orderByDate(needDate, supplier?.leadTimeDays ?? 0, input.reorderMarginDays);
  return [{
    productId: product.productId,
    productName: product.productName,
    presentationId: order.presentation.id,
    presentationLabel: order.presentation.label,
    supplierId: supplier?.id ?? null,
    supplierName: supplier?.name ?? null,
    leadTimeDays: supplier?.leadTimeDays ?? null,
    needDate,
    orderBy,
    urgent: orderBy <= input.today,
    shortfallDoses: product.shortfallDoses,
    topUpDoses,
    safetyStockDoses: product.safetyStockDoses,
    vialsRequired: order.vialsRequired,
    packs: order.packs,
    vials: order.vials,
    doses: order.doses,
    value: order.value,
  }];
}

function byName(a: ProductOutlook, b: ProductOutlook): number {
  return a.productName.localeCompare(b.productName) || a.productId - b.productId;
}
