// How many vials each lot of one expiry date gives: the most doses the date can give while later dates make up the rest exactly, in the fewest vials, lowest ids first.
import { addLotToFewestVials, emptyFewestVials, UNREACHABLE } from './fewest-vials.js';
import { isReachable, type ReachableTotals } from './reachable-totals.js';

export interface GroupLot {
  /** Vial size in the planner's dose units. */
  readonly size: number;
  readonly vials: number;
}

/**
 * `lots` share one expiry date and are in id order; `reachableAfter` holds the totals later dates can make.
 * Some total d this group can make must leave `remaining − d` reachable by later dates, or there is no answer.
 */
export function takeFromExpiryGroup(lots: readonly GroupLot[], remaining: number, reachableAfter: ReachableTotals): number[] {
  const size = lots[0]!.size;
  if (lots.every((lot) => lot.size === size)) return takeOneSize(lots, size, remaining, reachableAfter);
  const most = Math.min(remaining, lots.reduce((sum, lot) => sum + lot.size * lot.vials, 0));
  // fewestFrom[j]: fewest vials making each total up to `most` from lots j, j+1, ….
  const fewestFrom: Int32Array[] = [emptyFewestVials(most + 1)];
  for (let j = lots.length - 1; j >= 0; j--) fewestFrom.push(addLotToFewestVials(fewestFrom[fewestFrom.length - 1]!, lots[j]!.size, lots[j]!.vials));
  fewestFrom.reverse();

  const fewestAll = fewestFrom[0]!;
  const unreachable = UNREACHABLE; // a local copy: module bindings compiled to getters cost a call per read in the hot loops
  let fromGroup = most;
  while (fromGroup >= 0 && (fewestAll[fromGroup] === unreachable || !isReachable(reachableAfter, remaining - fromGroup))) fromGroup--;
  if (fromGroup < 0) throw new Error('no feasible split for the expiry group');

  const taken: number[] = [];
  let left = fromGroup;
  lots.forEach(({ size, vials }, j) => {
    const here = fewestFrom[j]!;
    const after = fewestFrom[j + 1]!;
    // The largest count that still allows the fewest vials overall: equal counts go to the lowest id.
    let count = Math.min(vials, Math.floor(left / size));
    while (after[left - count * size] === unreachable || after[left - count * size]! + count !== here[left]) count--;
    taken.push(count);
    left -= count * size;
  });
  return taken;
}

/** One vial size: the vial count is fixed by the total, so walk down its multiples and fill the lowest ids first. */
function takeOneSize(lots: readonly GroupLot[], size: number, remaining: number, reachableAfter: ReachableTotals): number[] {
  const available = lots.reduce((sum, lot) => sum + lot.vials, 0);
  let count = Math.min(available, Math.floor(remaining / size));
  while (count >= 0 && !isReachable(reachableAfter, remaining - count * size)) count--;
  if (count < 0) throw new Error('no feasible split for the expiry group');
  return lots.map((lot) => {
    const taken = Math.min(lot.vials, count);
    count -= taken;
    return taken;
  });
}
