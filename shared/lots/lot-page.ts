// One lot's page as the API sends it: what it is, its status and holds, where its vials are and have been, who received it.
import type { LotExposure } from '../exposure/exposure-types.js';
import type { HoldCause } from './hold-causes.js';
import type { HoldDecisionKind, LotStatus } from './lot-status.js';
import type { MovementKind } from './movement-kinds.js';

export interface LotPageDecision {
  id: number;
  decision: HoldDecisionKind;
  condition: string;
  notes: string;
  signerName: string;
  signedAt: string;
  supersedesId: number | null;
  current: boolean;
}

export interface LotPageHold {
  id: number;
  cause: HoldCause;
  reason: string;
  openedAt: string;
  openedBy: string | null;
  /** Still keeps the lot from use (no current decision in its favour). */
  standing: boolean;
  decisions: LotPageDecision[];
}

/** A fridge as the user may see it; one on a site the user cannot see shows only that it is elsewhere. */
export interface LotPagePlace {
  fridgeId: number | null;
  fridgeCode: string;
  siteId: number | null;
  siteName: string;
  /** The site's zone, whose clock a movement's time there is shown on; null for another site. */
  timeZone: string | null;
}

export interface LotPageLocation extends LotPagePlace {
  vials: number;
}

export interface LotPageMovement {
  id: number;
  kind: MovementKind;
  vials: number;
  from: LotPagePlace | null;
  to: LotPagePlace | null;
  leftAt: string | null;
  at: string;
  sourceKind: string;
  sourceId: number | null;
  reason: string;
  recordedBy: string | null;
}

export interface LotPageFlock {
  vaccinationId: number;
  plannedDate: string;
  status: string;
  flockId: number;
  flockName: string;
  houseName: string;
  siteName: string;
  vialsIssued: number;
  vialsReturned: number;
}

/** A planned move of this lot's vials between sites, waiting for storage staff to carry it out. */
export interface LotPagePlannedTransfer {
  id: number;
  fromSiteId: number;
  fromSiteName: string;
  toSiteId: number;
  toSiteName: string;
  vials: number;
  plannedOn: string;
}

export interface LotPage {
  id: number;
  lotNumber: string;
  expiry: string;
  expiryDayGiven: boolean;
  product: { id: number; name: string; storageLow: number; storageHigh: number; storageUnit: 'F' | 'C'; freezeSensitive: boolean; timeOutLimitMinutes: number | null };
  presentation: { id: number; dosesPerVial: number; vialsPerPack: number };
  status: LotStatus;
  vialsOnHand: number;
  holds: LotPageHold[];
  locations: LotPageLocation[];
  history: LotPageMovement[];
  flocks: LotPageFlock[];
  /** Open planned transfers whose both sites the user sees. */
  plannedTransfers: LotPagePlannedTransfer[];
  /**
   * The zone of the lot's site (the first the user sees, in the order its vials reached them): its holds, decisions and
   * exposure times are shown on that clock; a movement's on the clock of the site it happened at.
   */
  timeZone: string;
  /** What the lot lived through, judged by its own product's range (as GET /api/exposure/lots/:lotId computes it). */
  exposure: LotExposure & { limits: { lowC: number; highC: number } };
}
