// Public surface of the vaccination day's rules: visit order, readiness checks, mixing, returns and reconciliation.
export { visitOrder, type Visit } from './visit-order.js';
export { twelveHourRule, QUARANTINE_HOURS, type FarmVisit, type QuarantineResult } from './twelve-hour-rule.js';
export { waterVolumeMl, useByInstant, msLeft, type MixInput } from './mixing.js';
export { checkReturn, reconcileVials, type ReturnCheck, type Reconciliation } from './vial-returns.js';
export { heatAdvice, type HeatAdvice } from './heat-advice.js';
export { usesSprayer, noSprayerText } from './sprayer.js';
