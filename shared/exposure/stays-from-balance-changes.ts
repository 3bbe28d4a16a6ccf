// A lot's stays per fridge from its ledger: a fridge holds the lot for as long as its running balance there is above zero.
import type { Stay } from './exposure-types.js';

/** A change of the lot's vials in one fridge at one instant (a receipt +, a transfer's departure −, its arrival +, ...). */
export interface BalanceChange {
  fridgeId: number;
  at: number;
  vials: number;
}

export function staysFromBalanceChanges(changes: readonly BalanceChange[]): Stay[] {
  const byFridge = new Map<number, BalanceChange[]>();
  for (const change of changes) {
    const list = byFridge.get(change.fridgeId) ?? [];
    list.push(change);
    byFridge.set(change.fridgeId, list);
  }
  const stays: Stay[] = [];
  for (const [fridgeId, list] of byFridge) {
    // Arrivals before departures at the same instant, so a same-moment swap never looks like an empty fridge.
    list.sort((a, b) => a.at - b.at || b.vials - a.vials);
    let balance = 0;
    let openedAt: number | null = null;
    for (const change of list) {
      balance += change.vials;
      if (balance > 0 && openedAt === null) openedAt = change.at;
      if (balance <= 0 && openedAt !== null) {
        if (change.at > openedAt) stays.push({ fridgeId, from: openedAt, to: change.at });
        openedAt = null;
      }
    }
    if (openedAt !== null) stays.push({ fridgeId, from: openedAt, to: null });
  }
  return stays.sort((a, b) => a.from - b.from || a.fridgeId - b.fridgeId);
}
