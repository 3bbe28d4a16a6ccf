// Which pack a suggestion orders: purchasing's choice when set, else the one that covers the need at least cost.
import { roundUpToPacks, vialsForDoses } from '../inventory/pack-rounding.js';
import type { ProjectionPresentation } from './projection-types.js';

export interface PackOrder {
  readonly presentation: ProjectionPresentation;
  readonly vialsRequired: number;
  readonly packs: number;
  readonly vials: number;
  readonly doses: number;
  readonly value: number | null;
}

/**
 * Each short vaccination opens its own vials (an opened vial serves one house), so vials are counted per
 * shortfall, then the safety-stock top-up, then rounded up to whole packs.
 */
export function packOrder(presentation: ProjectionPresentation, shortfalls: readonly number[], topUpDoses: number): PackOrder {
  const perShortfall = shortfalls.reduce((sum, doses) => sum + vialsForDoses(doses, presentation.dosesPerVial), 0);
  const vialsRequired = perShortfall + vialsForDoses(topUpDoses, presentation.dosesPerVial);
  const { packs, vials } = roundUpToPacks(vialsRequired, presentation.vialsPerPack);
  const value = presentation.unitPrice === null ? null : Math.round(vials * presentation.unitPrice * 100) / 100;
  return { presentation, vialsRequired, packs, vials, doses: vials * presentation.dosesPerVial, value };
}

/**
 * Least cost when every candidate has a price (prices differ per dose between pack sizes), otherwise the fewest
 * doses bought; then fewer packs, then the lower id, so the choice never depends on input order.
 */
export function choosePresentation(
  candidates: readonly ProjectionPresentation[],
  preferredId: number | null,
  shortfalls: readonly number[],
  topUpDoses: number,
): PackOrder | null {
  const preferred = candidates.find((candidate) => candidate.id === preferredId);
  if (preferred) return packOrder(preferred, shortfalls, topUpDoses);
  if (!candidates.length) return null;
  const orders = candidates.map((candidate) => packOrder(candidate, shortfalls, topUpDoses));
  const byCost = orders.every((order) => order.value !== null);
  return orders.reduce((best, order) => (better(order, best, byCost) ? order : best));
}

function better(a: PackOrder, b: PackOrder, byCost: boolean): boolean {
  if (byCost && a.value !== b.value) return a.value! < b.value!;
  if (a.doses !== b.doses) return a.doses < b.doses;
  if (a.packs !== b.packs) return a.packs < b.packs;
  return a.presentation.id < b.presentation.id;
}
