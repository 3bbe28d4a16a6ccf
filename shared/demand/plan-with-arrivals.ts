// The planner over stock that arrives later (open orders, planned transfers): a lot serves only vaccinations on or after its arrival.
import { compareIds, type EntityId } from '../planning/entity-id.js';
import { expiringUnused } from '../planning/expiring-unused.js';
import type { IsoDate } from '../planning/iso-date.js';
import { normalizeExpiry } from '../planning/month-end-expiry.js';
import type { Lot, Plan, Vaccination, VaccinationPlan } from '../planning/plan-types.js';
import { planVaccinations } from '../planning/plan-vaccinations.js';

export interface ArrivingLot extends Lot {
  /** First day the lot can be used; absent or null when it is on hand now. */
  readonly availableFrom?: IsoDate | null;
}

/**
 * Walks the vaccinations in the planner's own order (date, then id) and lets the planner choose each one's vials
 * from the lots arrived by its date, with what earlier vaccinations took already gone. With every lot on hand
 * this is exactly planVaccinations; the planner's rules stay in one place.
 */
export function planWithArrivals(request: { lots: readonly ArrivingLot[]; vaccinations: readonly Vaccination[]; overagePercent?: number }): Plan {
  const lots = request.lots.map((lot) => ({ ...lot, expiry: normalizeExpiry(lot.expiry) }));
  const index = new Map<EntityId, number>();
  lots.forEach((lot, i) => {
    if (index.has(lot.id)) throw new RangeError(`duplicate lot id ${JSON.stringify(lot.id)}`);
    index.set(lot.id, i);
  });
  const vialsLeft = lots.map((lot) => lot.vials);
  const ordered = [...request.vaccinations].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : compareIds(a.id, b.id)));

  const planned = ordered.map((vaccination): VaccinationPlan => {
    const arrived = lots.flatMap((lot, i) =>
      vialsLeft[i]! > 0 && (lot.availableFrom == null || lot.availableFrom <= vaccination.date)
        ? [{ id: lot.id, product: lot.product, dosesPerVial: lot.dosesPerVial, vials: vialsLeft[i]!, expiry: lot.expiry, status: lot.status }]
        : [],
    );
    const [plan] = planVaccinations({ lots: arrived, vaccinations: [vaccination], overagePercent: request.overagePercent }).vaccinations;
    for (const allocation of plan!.allocations) vialsLeft[index.get(allocation.lot)!]! -= allocation.vials;
    return plan!;
  });

  return {
    vaccinations: planned,
    lotsLeft: lots.map((lot, i) => ({ id: lot.id, vials: vialsLeft[i]! })),
    expiringUnused: expiringUnused(lots, vialsLeft, request.vaccinations),
  };
}
