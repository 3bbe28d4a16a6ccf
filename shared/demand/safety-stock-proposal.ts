// Proposes a product's safety stock from its weekly use by the textbook rule (Stevenson: ROP = d̄·LT + z·σd·√LT).
import { proposeSafetyStock } from '../inventory/propose-safety-stock.js';

/** Fewer weeks than this say too little about variation to base a stock level on. */
export const MIN_HISTORY_WEEKS = 4;

export interface SafetyStockProposalView {
  weeks: number;
  meanWeeklyDoses: number;
  sdWeeklyDoses: number;
  serviceLevel: number;
  z: number;
  leadTimeDays: number;
  /** z·σd·√LT and d̄·LT + z·σd·√LT as computed, before rounding. */
  safetyStock: number;
  reorderPoint: number;
  /** z·σd·√LT rounded up to a whole dose. */
  safetyStockDoses: number;
  reorderPointDoses: number;
}

export function proposeFromWeeklyUse(history: readonly number[], serviceLevel: number, leadTimeDays: number): SafetyStockProposalView | null {
  if (history.length < MIN_HISTORY_WEEKS) return null;
  const proposal = proposeSafetyStock({ history, serviceLevel, leadTimePeriods: leadTimeDays / 7 });
  return {
    weeks: history.length,
    meanWeeklyDoses: proposal.meanDemandPerPeriod,
    sdWeeklyDoses: proposal.demandSdPerPeriod,
    serviceLevel,
    z: proposal.z,
    leadTimeDays,
    safetyStock: proposal.safetyStock,
    reorderPoint: proposal.reorderPoint,
    // A negative z (service below 50 %) would propose negative stock; none is the floor.
    safetyStockDoses: Math.max(0, Math.ceil(proposal.safetyStock - 1e-9)),
    reorderPointDoses: Math.max(0, Math.ceil(proposal.reorderPoint - 1e-9)),
  };
}
