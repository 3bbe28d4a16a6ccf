// A received shipment as the API sends it: checks, reading, lines with their lots and holds, photos, findings.
import type { HoldView } from '../lots/hold-causes.js';
import type { ArrivalChecks, ReadingPlace, ShipmentOutcome } from './arrival-checks.js';
import type { DiscrepancyKind, Finding, WarningKind } from './assess-shipment.js';

export interface ShipmentLineView {
  id: number;
  lineNo: number;
  presentationId: number;
  label: string;
  lotId: number | null;
  lotNumber: string;
  expiry: string;
  expiryDayGiven: boolean;
  vialsExpected: number;
  vialsIntact: number;
  vialsBroken: number;
  vialsMissing: number;
  accepted: boolean;
  /** Vials this line put into stock. */
  vialsStocked: number;
  fridgeId: number | null;
  fridgeName: string | null;
  storedAt: string | null;
  notes: string;
  holds: HoldView[];
}

export interface ShipmentPhotoView {
  id: number;
  width: number;
  height: number;
  displayUrl: string;
  thumbUrl: string;
}

export interface ShipmentSummary {
  id: number;
  siteId: number;
  siteName: string;
  supplierName: string | null;
  purchaseOrderReference: string | null;
  carrier: string;
  arrivedAt: string;
  outcome: ShipmentOutcome;
  lineCount: number;
  photoCount: number;
  discrepancyCount: number;
  lotsOnHold: number;
  receivedBy: string;
}

export interface ShipmentView extends ShipmentSummary {
  purchaseOrderId: number | null;
  supplierId: number | null;
  trackingNumber: string;
  shippedAt: string | null;
  transitHours: number | null;
  checks: ArrivalChecks;
  reading: { value: number; unit: 'F' | 'C'; place: ReadingPlace } | null;
  notes: string;
  siteTimeZone: string;
  lines: ShipmentLineView[];
  photos: ShipmentPhotoView[];
  discrepancies: Finding<DiscrepancyKind>[];
  warnings: Finding<WarningKind>[];
  reportMailedAt: string | null;
  reportMailedTo: string[];
}

/** What the receiving form needs for one site: its fridges, its setting, and the shipments expected there. */
export interface ReceivingContext {
  siteId: number;
  siteName: string;
  timeZone: string;
  storeWithinMinutes: number;
  fridges: { id: number; code: string; name: string }[];
}
