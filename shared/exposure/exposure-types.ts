// The inputs and results of a lot's temperature exposure: where its vials were, what those fridges read, what that adds up to.
import type { CelsiusLimits } from '../temperature/temperature-range.js';
import type { RangeSide } from '../temperature/classify-temperature.js';

/** Vials of the lot were in this fridge from `from` until `to` (epoch ms; `to` null while they still are). */
export interface Stay {
  fridgeId: number;
  from: number;
  to: number | null;
}

/** Vials were out of any fridge (a transfer between fridges, or issued for a vaccination). */
export interface TimeOut {
  reason: 'transfer' | 'issue';
  from: number;
  /** Null when the vials never came back to a fridge (used, or not yet recorded). */
  to: number | null;
}

export interface FridgeReading {
  at: number;
  tempC: number;
  /**
   * The time this reading stands for when its own logger's series says so (a backup reading filling the primary's
   * gap stands for the backup's step, not the primary's); absent, the step to the next reading decides.
   */
  standsForMs?: number;
}

export interface ExposureInput {
  stays: Stay[];
  timeOut?: TimeOut[];
  /** Each fridge's readings in time order (primary logger, backup filling its gaps). */
  readings: Map<number, FridgeReading[]>;
  /** The lot's own product label range, which may be narrower or wider than the fridge's alarm range. */
  limits: CelsiusLimits;
  freezeSensitive: boolean;
  /** Longest time out of a fridge the product allows, in minutes (null: no limit known). */
  timeOutLimitMinutes: number | null;
  /** The arrival reading was outside the range: an exposure of unknown length before storage. */
  arrivalOutOfRange?: boolean;
  /** Open stays end here (now, or the report's end). */
  asOf: number;
}

/** A stretch of time a lot's vials spent at one known temperature. */
export interface Segment {
  fridgeId: number;
  start: number;
  end: number;
  tempC: number;
}

export interface UnknownStretch {
  fridgeId: number;
  start: number;
  end: number;
  minutes: number;
  /** A gap between readings, or no reading at all for that part of the stay (before the first or after the last). */
  reason: 'gap' | 'no-readings';
}

export interface LotExcursion {
  kind: Exclude<RangeSide, 'in'>;
  fridgeIds: number[];
  start: number;
  end: number;
  minutes: number;
  peakC: number;
  /** Mean kinetic temperature over the 24 hours ending when this excursion ends (USP PF 44(4) proposes 24 h). */
  mkt24hC: number;
}

export interface TimeOutExposure extends TimeOut {
  minutes: number | null;
  overLimit: boolean;
}

export interface LotExposure {
  storageMinutes: number;
  minutesAbove: number;
  minutesBelow: number;
  minutesUnknown: number;
  minC: number | null;
  maxC: number | null;
  mktStorageC: number | null;
  excursions: LotExcursion[];
  unknown: UnknownStretch[];
  froze: boolean;
  firstFreezeAt: number | null;
  timeOut: TimeOutExposure[];
  minutesOutOfFridge: number;
  arrivalExposureUnknown: boolean;
}
