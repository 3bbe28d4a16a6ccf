// Public surface of lot exposure: the vials' location history joined with the fridges' readings.
export type {
  ExposureInput, FridgeReading, LotExcursion, LotExposure, Segment, Stay, TimeOut, TimeOutExposure, UnknownStretch,
} from './exposure-types.js';
export { fridgeExposureReadings } from './fridge-exposure-readings.js';
export { lotExposure } from './lot-exposure.js';
export { staySegments } from './stay-segments.js';
export { unionLengthMs, type Interval } from './interval-union.js';
export { staysFromBalanceChanges, type BalanceChange } from './stays-from-balance-changes.js';
export { movementHistory, type LedgerMovement, type MovementHistory } from './movement-history.js';
