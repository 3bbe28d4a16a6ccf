// Proposes safety stock and a reorder point from past per-period demand and a chosen service level.
import { demandStatistics } from './demand-statistics.js';
import { reorderPointForVariableDemand } from './reorder-point.js';
import { zForServiceLevel } from './service-level-z.js';

export interface SafetyStockProposal {
  readonly meanDemandPerPeriod: number;
  readonly demandSdPerPeriod: number;
  readonly z: number;
  /** z·σd·√LT, in the history's units (usually doses). */
  readonly safetyStock: number;
  readonly reorderPoint: number;
}

/** `leadTimePeriods` is in the history's periods (days for a daily history); 1 by default. */
export function proposeSafetyStock(input: {
  history: readonly number[];
  serviceLevel: number;
  leadTimePeriods?: number;
}): SafetyStockProposal {
  const { mean, sampleSd } = demandStatistics(input.history);
  const z = zForServiceLevel(input.serviceLevel);
  const { safetyStock, reorderPoint } = reorderPointForVariableDemand({
    meanDemandPerPeriod: mean,
    demandSdPerPeriod: sampleSd,
    leadTimePeriods: input.leadTimePeriods ?? 1,
    z,
  });
  return { meanDemandPerPeriod: mean, demandSdPerPeriod: sampleSd, z, safetyStock, reorderPoint };
}
