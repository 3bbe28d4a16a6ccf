// Reorder point by the textbook rule (Stevenson, Operations Management, 14th ed., ch. 12): expected lead-time demand plus z standard deviations of it.
export interface ReorderPoint {
  readonly safetyStock: number;
  readonly reorderPoint: number;
}

/** ROP = expected lead-time demand + z·σ(lead-time demand). */
export function reorderPoint(input: { expectedLeadTimeDemand: number; leadTimeDemandSd: number; z: number }): ReorderPoint {
  requireNonNegative(input.expectedLeadTimeDemand, 'expected lead-time demand');
  requireNonNegative(input.leadTimeDemandSd, 'lead-time demand standard deviation');
  if (!Number.isFinite(input.z)) throw new RangeError(`z must be a finite number, got ${input.z}`);
  const safetyStock = input.z * input.leadTimeDemandSd;
  return { safetyStock, reorderPoint: input.expectedLeadTimeDemand + safetyStock };
}

/** Per-period demand varies, lead time is fixed: ROP = d̄·LT + z·σd·√LT (independent periods, so variances add). */
export function reorderPointForVariableDemand(input: {
  meanDemandPerPeriod: number;
  demandSdPerPeriod: number;
  leadTimePeriods: number;
  z: number;
}): ReorderPoint {
  requireNonNegative(input.meanDemandPerPeriod, 'mean demand per period');
  requireNonNegative(input.demandSdPerPeriod, 'demand standard deviation per period');
  requireNonNegative(input.leadTimePeriods, 'lead time periods');
  return reorderPoint({
    expectedLeadTimeDemand: input.meanDemandPerPeriod * input.leadTimePeriods,
    leadTimeDemandSd: input.demandSdPerPeriod * Math.sqrt(input.leadTimePeriods),
    z: input.z,
  });
}

function requireNonNegative(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a number ≥ 0, got ${value}`);
}
