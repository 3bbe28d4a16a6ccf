// What the site projection reads (stock, arrivals, vaccinations, settings) and what it answers (plan, alerts, suggestions).
import type { IsoDate } from '../planning/iso-date.js';
import type { LotStatus } from '../planning/plan-types.js';

export type StockSource = 'stock' | 'order' | 'transfer';

export interface ProjectionLot {
  /** A lot's id for stock on hand; "order-<line id>" or "transfer-<id>" for what is on its way. */
  readonly id: number | string;
  readonly lotId: number | null;
  readonly label: string;
  readonly source: StockSource;
  readonly productId: number;
  readonly presentationId: number;
  readonly dosesPerVial: number;
  readonly vials: number;
  /** Last usable day; stock on order has no lot yet, so no known expiry (9999-12-31). */
  readonly expiry: IsoDate;
  readonly status: LotStatus;
  readonly availableFrom: IsoDate | null;
}

export interface ProjectionVaccination {
  readonly id: number;
  readonly flockId: number;
  readonly flockName: string;
  readonly houseName: string;
  readonly productId: number;
  readonly plannedDate: IsoDate;
  readonly birds: number;
}

export interface ProjectionPresentation {
  readonly id: number;
  readonly productId: number;
  readonly label: string;
  readonly dosesPerVial: number;
  readonly vialsPerPack: number;
  readonly unitPrice: number | null;
}

export interface ProjectionSupplier {
  readonly id: number;
  readonly name: string;
  readonly leadTimeDays: number;
}

export interface ProductPlanning {
  readonly productId: number;
  readonly productName: string;
  /** In doses, or days of cover at the horizon's average daily need. */
  readonly safetyStock: { kind: 'doses'; doses: number } | { kind: 'days'; days: number };
  readonly supplier: ProjectionSupplier | null;
  /** The pack purchasing prefers to order; null lets the projection choose. */
  readonly presentationId: number | null;
}

export interface ProjectionInput {
  readonly today: IsoDate;
  readonly horizonDays: number;
  readonly overagePercent: number;
  readonly expiryAlertDays: readonly number[];
  readonly reorderMarginDays: number;
  readonly lots: readonly ProjectionLot[];
  readonly vaccinations: readonly ProjectionVaccination[];
  readonly presentations: readonly ProjectionPresentation[];
  /** One per product that has stock, vaccinations or settings. */
  readonly products: readonly ProductPlanning[];
}

export interface ProjectedAllocation {
  lot: number | string;
  label: string;
  source: StockSource;
  vials: number;
  doses: number;
}

export interface ProjectedVaccination {
  id: number;
  flockId: number;
  flockName: string;
  houseName: string;
  productId: number;
  productName: string;
  plannedDate: IsoDate;
  /** Planned before today and not yet done: planned as if today. */
  overdue: boolean;
  birds: number;
  dosesNeeded: number;
  allocations: ProjectedAllocation[];
  dosesAllocated: number;
  dosesWasted: number;
  shortfallDoses: number;
}

export interface ProductOutlook {
  productId: number;
  productName: string;
  dosesOnHand: number;
  dosesOnHold: number;
  dosesIncoming: number;
  dosesNeeded: number;
  shortfallDoses: number;
  safetyStockDoses: number;
  /** The lowest usable stock in the horizon, after the vaccinations planned by then. */
  lowestDoses: number;
  lowestOn: IsoDate;
  firstShortfallDate: IsoDate | null;
  belowSafetyFrom: IsoDate | null;
}

export interface UncoveredAlert {
  vaccinationId: number;
  plannedDate: IsoDate;
  flockId: number;
  flockName: string;
  houseName: string;
  productId: number;
  productName: string;
  shortfallDoses: number;
}

export interface ExpiringAlert {
  lotId: number;
  lotNumber: string;
  productId: number;
  productName: string;
  presentationId: number;
  expiry: IsoDate;
  daysLeft: number;
  /** The smallest alert window (days) the expiry falls in; 0 when already expired. */
  window: number;
  vials: number;
  doses: number;
  value: number | null;
  onHold: boolean;
}

export interface ExpireUnusedAlert {
  lotId: number;
  lotNumber: string;
  productId: number;
  productName: string;
  presentationId: number;
  expiry: IsoDate;
  vials: number;
  doses: number;
  /** Vials × the presentation's unit price; null when the price is not known. */
  valueLost: number | null;
  /** A vaccination of the product comes after the expiry: these vials cannot serve it. */
  neededAfterExpiry: boolean;
}

export interface BelowSafetyAlert {
  productId: number;
  productName: string;
  from: IsoDate;
  lowestDoses: number;
  safetyStockDoses: number;
}

export interface ReorderSuggestion {
  productId: number;
  productName: string;
  presentationId: number;
  presentationLabel: string;
  supplierId: number | null;
  supplierName: string | null;
  leadTimeDays: number | null;
  /** The first shortfall, or the day stock first drops below safety stock. */
  needDate: IsoDate;
  orderBy: IsoDate;
  /** The order-by date is today or already past. */
  urgent: boolean;
  shortfallDoses: number;
  /** Doses to bring the lowest stock back up to safety stock. */
  topUpDoses: number;
  safetyStockDoses: number;
  vialsRequired: number;
  packs: number;
  vials: number;
  doses: number;
  value: number | null;
}

export interface SiteProjection {
  today: IsoDate;
  horizonEnd: IsoDate;
  vaccinations: ProjectedVaccination[];
  products: ProductOutlook[];
  alerts: {
    uncovered: UncoveredAlert[];
    expiring: ExpiringAlert[];
    expireUnused: ExpireUnusedAlert[];
    belowSafety: BelowSafetyAlert[];
  };
  suggestions: ReorderSuggestion[];
  /** Vials of each projection lot the plan leaves over at the horizon's end. */
  lotsLeft: { id: number | string; vials: number }[];
}

