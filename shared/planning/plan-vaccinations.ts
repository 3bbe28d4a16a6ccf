// Plans every vaccination in date order against one shared stock of lots: what an earlier vaccination takes, later ones cannot.
import { chooseVials } from './choose-vials.js';
import { dosesNeeded, overagePercentToBasisPoints } from './doses-needed.js';
import { compareIds, type EntityId } from './entity-id.js';
import { expiringUnused } from './expiring-unused.js';
import { isIsoDate } from './iso-date.js';
import { normalizeExpiry } from './month-end-expiry.js';
import type { Plan, PlanRequest, Vaccination, VaccinationPlan } from './plan-types.js';
import { isLotUsableOn } from './usable-lots.js';

/** Vaccinations come back in planning order: by date, then id. Throws RangeError on inputs the schema would reject. */
export function planVaccinations(request: PlanRequest): Plan {
  const overage = overagePercentToBasisPoints(request.overagePercent ?? 0);
  const lots = request.lots.map((lot) => ({ ...lot, expiry: normalizeExpiry(lot.expiry) }));
  const indexById = new Map<EntityId, number>();
  lots.forEach((lot, i) => {
    if (indexById.has(lot.id)) throw new RangeError(`duplicate lot id ${JSON.stringify(lot.id)}`);
    indexById.set(lot.id, i);
  });
  for (const vaccination of request.vaccinations) {
    if (!isIsoDate(vaccination.date)) throw new RangeError(`vaccination ${String(vaccination.id)}: bad date ${JSON.stringify(vaccination.date)}`);
  }
  const byProduct = new Map<string, number[]>();
  lots.forEach((lot, i) => {
    const indices = byProduct.get(lot.product);
    if (indices) indices.push(i);
    else byProduct.set(lot.product, [i]);
  });
  const vialsLeft = lots.map((lot) => lot.vials);

  const planned = [...request.vaccinations].sort(byDateThenId).map((vaccination): VaccinationPlan => {
    const needed = dosesNeeded(vaccination.birds, overage);
    const sources = (byProduct.get(vaccination.product) ?? [])
      .filter((i) => vialsLeft[i]! > 0 && isLotUsableOn(lots[i]!, vaccination.product, vaccination.date))
      .map((i) => ({ ...lots[i]!, vials: vialsLeft[i]! }));
    const allocations = chooseVials(needed, sources);
    for (const allocation of allocations) vialsLeft[indexById.get(allocation.lot)!]! -= allocation.vials;
    const allocated = allocations.reduce((sum, allocation) => sum + allocation.doses, 0);
    return {
      id: vaccination.id,
      dosesNeeded: needed,
      allocations,
      dosesAllocated: allocated,
      dosesWasted: Math.max(0, allocated - needed),
      shortfallDoses: Math.max(0, needed - allocated),
    };
  });

  return {
    vaccinations: planned,
    lotsLeft: lots.map((lot, i) => ({ id: lot.id, vials: vialsLeft[i]! })),
    expiringUnused: expiringUnused(lots, vialsLeft, request.vaccinations),
  };
}

function byDateThenId(a: Vaccination, b: Vaccination): number {
  return a.date < b.date ? -1 : a.date > b.date ? 1 : compareIds(a.id, b.id);
}
