// A site's projection over the horizon: the planner's allocation of its stock and arrivals, each product's outlook, the alerts and the reorder suggestions.
import { addDays } from '../planning/iso-date.js';
import { expireUnusedAlerts, expiringAlerts } from './lot-alerts.js';
import { planWithArrivals } from './plan-with-arrivals.js';
import { productOutlook } from './product-outlook.js';
import type { ProductOutlook, ProjectedVaccination, ProjectionInput, SiteProjection } from './projection-types.js';
import { suggestReorder } from './suggest-reorder.js';

export function projectSite(input: ProjectionInput): SiteProjection {
  const { today } = input;
  const horizonEnd = addDays(today, input.horizonDays);
  const planning = new Map(input.products.map((product) => [product.productId, product]));
  const productName = (id: number) => planning.get(id)?.productName ?? `Product ${id}`;
  const lotsById = new Map(input.lots.map((lot) => [lot.id, lot]));

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

  const productIds = [...new Set([...input.products.map((p) => p.productId), ...input.lots.map((l) => l.productId), ...inScope.map((v) => v.productId)])];
  const products = productIds.map((id) => productOutlook(id, input, vaccinations, horizonEnd, planning.get(id), productName(id))).sort(byName);

  const expiring = expiringAlerts(input, productName);
  const expireUnused = expireUnusedAlerts(input, plan.lotsLeft, new Set(plan.expiringUnused.map((entry) => entry.lot)), horizonEnd, productName);

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
      expiring,
      expireUnused,
      belowSafety: products
        .filter((p) => p.belowSafetyFrom !== null)
        .map((p) => ({ productId: p.productId, productName: p.productName, from: p.belowSafetyFrom!, lowestDoses: p.lowestDoses, safetyStockDoses: p.safetyStockDoses })),
    },
    suggestions: products
      .flatMap((p) => suggestReorder(p, input, vaccinations, planning.get(p.productId)))
      .sort((a, b) => a.orderBy.localeCompare(b.orderBy) || a.productName.localeCompare(b.productName)),
    lotsLeft: plan.lotsLeft,
  };
}

function byName(a: ProductOutlook, b: ProductOutlook): number {
  return a.productName.localeCompare(b.productName) || a.productId - b.productId;
}
