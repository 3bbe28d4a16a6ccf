// Picks vials for one vaccination: least shortfall, then fewest opened-but-unneeded doses, then earliest expiry, then fewest vials, then lowest lot ids.
import { compareIds, type EntityId } from './entity-id.js';
import type { IsoDate } from './iso-date.js';
import type { Allocation } from './plan-types.js';
import { addLotToReachable, emptyReachable, isReachable, type ReachableTotals } from './reachable-totals.js';
import { takeFromExpiryGroup } from './take-from-expiry-group.js';

export interface VialSource {
  readonly id: EntityId;
  readonly dosesPerVial: number;
  /** Vials still available to this vaccination. */
  readonly vials: number;
  /** Last usable day, YYYY-MM-DD. */
  readonly expiry: IsoDate;
}

// Caps table length (in gcd-sized dose units) so memory stays in megabytes; vial sizes sharing a unit of 500 or
// 1,000 doses stay far below it, only near-coprime sizes (1,000 and 1,001) on millions of doses reach it.
export const MAX_TABLE_UNITS = 4_000_000;

/**
 * Exact choice under the rules, in order: (1) least shortfall, (2) fewest doses beyond the need,
 * (3) the most doses from the earliest expiry date, then the next date, …, (4) fewest vials,
 * (5) the most vials from the lowest lot id, then the next id, ….
 * Allocations come back in expiry order, then lot id; lots given no vials are left out.
 */
export function chooseVials(dosesNeeded: number, sources: readonly VialSource[]): Allocation[] {
  if (!Number.isSafeInteger(dosesNeeded) || dosesNeeded < 0) throw new RangeError(`doses needed must be a whole number ≥ 0, got ${dosesNeeded}`);
  for (const source of sources) checkSource(source);
  const lots = sources.filter((source) => source.vials > 0).sort(byExpiryThenId);
  if (dosesNeeded === 0 || lots.length === 0) return [];
  const capacity = lots.reduce((sum, lot) => sum + lot.vials * lot.dosesPerVial, 0);
  // Not enough stock: taking everything is the only way to minimise the shortfall.
  const taken = capacity <= dosesNeeded ? lots.map((lot) => lot.vials) : chooseWithinCapacity(dosesNeeded, lots);
  return lots.flatMap((lot, i) => (taken[i]! > 0 ? [{ lot: lot.id, vials: taken[i]!, doses: taken[i]! * lot.dosesPerVial }] : []));
}

function chooseWithinCapacity(dosesNeeded: number, lots: readonly VialSource[]): number[] {
  // Every total is a multiple of the gcd, so tables count in gcd-sized units instead of single doses.
  const unit = lots.reduce((g, lot) => gcd(g, lot.dosesPerVial), 0);
  const sizes = lots.map((lot) => lot.dosesPerVial / unit);
  const neededUnits = ceilDivide(dosesNeeded, unit);
  const limit = reachableTotalAtLeast(neededUnits, sizes, lots);
  if (limit > MAX_TABLE_UNITS) {
    throw new RangeError(`vial sizes share too small a common unit (${unit} doses) to plan ${dosesNeeded} doses exactly`);
  }
  const groups = groupByExpiry(lots);
  // reachableFrom[k]: totals the lots of expiry groups k, k+1, … can make together.
  const reachableFrom: ReachableTotals[] = [emptyReachable(limit)];
  for (let k = groups.length - 1; k >= 0; k--) {
    reachableFrom.push(groups[k]!.reduce((table, i) => addLotToReachable(table, sizes[i]!, lots[i]!.vials), reachableFrom[reachableFrom.length - 1]!));
  }
  reachableFrom.reverse();
  let remaining = neededUnits;
  while (!isReachable(reachableFrom[0]!, remaining)) remaining++;

  const taken = new Array<number>(lots.length).fill(0);
  for (let k = 0; k < groups.length && remaining > 0; k++) {
    const group = groups[k]!;
    const counts = takeFromExpiryGroup(
      group.map((i) => ({ size: sizes[i]!, vials: lots[i]!.vials })),
      remaining,
      reachableFrom[k + 1]!,
    );
    group.forEach((i, j) => {
      taken[i] = counts[j]!;
      remaining -= counts[j]! * sizes[i]!;
    });
  }
  return taken;
}

/**
 * Some reachable total ≥ `neededUnits`, so no better one lies above it. Largest vials first without passing the need,
 * then one vial of the smallest size left: it must cross, because every lot with vials left has vials bigger than the gap.
 */
function reachableTotalAtLeast(neededUnits: number, sizes: readonly number[], lots: readonly VialSource[]): number {
  const order = sizes.map((_, i) => i).sort((a, b) => sizes[b]! - sizes[a]!);
  let total = 0;
  let smallestLeft = Infinity;
  for (const i of order) {
    const vials = Math.min(lots[i]!.vials, Math.floor((neededUnits - total) / sizes[i]!));
    total += vials * sizes[i]!;
    if (vials < lots[i]!.vials) smallestLeft = Math.min(smallestLeft, sizes[i]!);
  }
  return total === neededUnits ? total : total + smallestLeft;
}

/** Indices of `lots` (already in expiry, then id order) split into runs sharing an expiry date. */
function groupByExpiry(lots: readonly VialSource[]): number[][] {
  const groups: number[][] = [];
  lots.forEach((lot, i) => {
    const last = groups[groups.length - 1];
    if (last && lots[last[0]!]!.expiry === lot.expiry) last.push(i);
    else groups.push([i]);
  });
  return groups;
}

function byExpiryThenId(a: VialSource, b: VialSource): number {
  return a.expiry < b.expiry ? -1 : a.expiry > b.expiry ? 1 : compareIds(a.id, b.id);
}

function checkSource(source: VialSource): void {
  if (!Number.isSafeInteger(source.dosesPerVial) || source.dosesPerVial < 1) {
    throw new RangeError(`lot ${String(source.id)}: doses per vial must be a whole number ≥ 1, got ${source.dosesPerVial}`);
  }
  if (!Number.isSafeInteger(source.vials) || source.vials < 0) {
    throw new RangeError(`lot ${String(source.id)}: vials must be a whole number ≥ 0, got ${source.vials}`);
  }
}

function gcd(a: number, b: number): number {
  while (b !== 0) [a, b] = [b, a % b];
  return a;
}

function ceilDivide(numerator: number, divisor: number): number {
  const remainder = numerator % divisor;
  return (numerator - remainder) / divisor + (remainder > 0 ? 1 : 0);
}
