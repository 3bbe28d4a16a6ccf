// A reorder suggestion for one product: order by the first need − lead time − margin, the shortfall plus safety stock in whole packs.
import { orderByDate } from '../inventory/order-by-date.js';
import type { IsoDate } from '../planning/iso-date.js';
import { choosePresentation } from './choose-presentation.js';
import type { ProductOutlook, ProductPlanning, ProjectedVaccination, ProjectionInput, ReorderSuggestion } from './projection-types.js';

/** The need starts at the first shortfall or the first day below safety stock, whichever comes first. */
export function suggestReorder(
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
