// Turns a lot's ledger movements into what exposure needs: balance changes per fridge and the times its vials were out.
import type { TimeOut } from './exposure-types.js';
import type { BalanceChange } from './stays-from-balance-changes.js';

export interface LedgerMovement {
  kind: 'receive' | 'transfer' | 'issue' | 'return' | 'discard' | 'adjust';
  vials: number;
  fromFridgeId: number | null;
  toFridgeId: number | null;
  /** When the vials left their fridge (transfers and issues); null when not recorded. */
  leftAt: number | null;
  at: number;
  sourceKind: string;
  sourceId: number | null;
}

export interface MovementHistory {
  changes: BalanceChange[];
  timeOut: TimeOut[];
}

export function movementHistory(movements: readonly LedgerMovement[]): MovementHistory {
  const changes: BalanceChange[] = [];
  const timeOut: TimeOut[] = [];
  const sorted = [...movements].sort((a, b) => a.at - b.at);
  for (const m of sorted) {
    const left = m.leftAt ?? m.at;
    if (m.fromFridgeId !== null) changes.push({ fridgeId: m.fromFridgeId, at: m.kind === 'transfer' || m.kind === 'issue' ? left : m.at, vials: -m.vials });
    if (m.toFridgeId !== null) changes.push({ fridgeId: m.toFridgeId, at: m.at, vials: m.vials });
    if (m.kind === 'transfer' && left < m.at) timeOut.push({ reason: 'transfer', from: left, to: m.at });
    if (m.kind === 'issue') {
      // Vials issued for a vaccination are out until a return from the same vaccination brings some back.
      const back = sorted.find((r) => r.kind === 'return' && r.sourceKind === m.sourceKind && r.sourceId === m.sourceId && r.at >= left);
      timeOut.push({ reason: 'issue', from: left, to: back ? back.at : null });
    }
  }
  return { changes, timeOut };
}
