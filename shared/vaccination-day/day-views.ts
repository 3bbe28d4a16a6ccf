// What the vaccination-day API answers: the day sheet, one vaccination's run, the mixing sheet (types only: the client imports them).
import type { ReadinessKind } from './readiness-kinds.js';

export interface LotToTake {
  lotId: number;
  lotNumber: string;
  expiry: string;
  dosesPerVial: number;
  /** Vials the plan takes from this lot for this vaccination. */
  vials: number;
  doses: number;
  /** Fridges of the site holding the lot, with their vials. */
  fridges: { fridgeId: number; fridgeName: string; vials: number }[];
}

export interface CheckView {
  id: number;
  kind: ReadinessKind;
  memberId: number | null;
  memberName: string | null;
  passed: boolean;
  message: string;
  note: string;
  recordedBy: string;
  recordedAt: string;
  override: { reason: string; decidedBy: string; decidedAt: string } | null;
}

export interface LotOut {
  lotId: number;
  lotNumber: string;
  dosesPerVial: number;
  issued: number;
  returned: number;
  /** Issued and not returned: used or still out. */
  out: number;
  /** When the first vials of this lot left the fridge for this vaccination. */
  leftAt: string;
  fromFridgeId: number;
}

export interface RunView {
  vaccinationId: number;
  status: string;
  siteId: number;
  siteName: string;
  /** The site's zone: the run's times (started, mixed, use by, signed, vials out) are shown and typed on its clock. */
  timeZone: string;
  houseName: string;
  flockId: number;
  flockName: string;
  productId: number;
  productName: string;
  route: string;
  plannedDate: string;
  ageDays: number;
  birds: number;
  dosesNeeded: number;
  shortfallDoses: number;
  lotsToTake: LotToTake[];
  /** Doses the plan takes from an order or a transfer not yet in the site's fridges (the crew cannot take them yet). */
  awaited: { source: 'order' | 'transfer'; label: string; doses: number }[];
  /** mL per 1,000 birds from the label or the veterinarian; null when nobody entered it. */
  waterMlPer1000: number | null;
  waterSource: 'label' | 'veterinarian' | null;
  waterMl: number | null;
  useWithinMinutes: number | null;
  timeOutLimitMinutes: number | null;
  heatLimitF: number | null;
  crew: { leadId: number; leadName: string; members: { id: number; name: string }[] } | null;
  checks: CheckView[];
  blockers: { kind: ReadinessKind; memberId: number | null; why: 'missing' | 'failed' }[];
  trial: { result: string; nozzleHeightCm: number; walkingPaceMPerMin: number; notes: string; recordedAt: string; photoIds: number[] } | null;
  startedAt: string | null;
  mixedAt: string | null;
  useBy: string | null;
  lotsOut: LotOut[];
  record: { id: number; signerName: string; signedAt: string; birdsVaccinated: number } | null;
}

export interface DaySheetEntry {
  visit: number;
  vaccinationId: number;
  siteId: number;
  siteName: string;
  houseName: string;
  flockName: string;
  productName: string;
  route: string;
  ageDays: number;
  birds: number;
  dosesNeeded: number;
  shortfallDoses: number;
  lotsToTake: LotToTake[];
  /** Doses the plan takes from an order or a transfer not yet in the site's fridges (the crew cannot take them yet). */
  awaited: { source: 'order' | 'transfer'; label: string; doses: number }[];
  waterMl: number | null;
  status: string;
  blockers: number;
  vialsOut: number;
}

export interface DaySheet {
  day: string;
  leadId: number;
  leadName: string;
  entries: DaySheetEntry[];
}

/** An entered water volume for the mix, as the API lists it. */
export interface WaterVolumeView {
  id: number;
  productId: number;
  productName: string;
  ageFromDays: number;
  ageToDays: number;
  mlPer1000Birds: number;
  source: 'label' | 'veterinarian';
  note: string;
  enteredBy: string;
  enteredAt: string;
}

/** A crew lead on a day, for a planner choosing whose sheet to read. */
export interface DayLead {
  id: number;
  name: string;
  siteNames: string[];
}
