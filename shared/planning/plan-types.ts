// The shapes the vaccine planner reads and writes; ids stay exactly as the caller gave them.
import type { EntityId } from './entity-id.js';
import type { IsoDate } from './iso-date.js';

export type LotStatus = 'usable' | 'hold' | 'discarded';

export interface Lot {
  readonly id: EntityId;
  readonly product: string;
  readonly dosesPerVial: number;
  readonly vials: number;
  /** YYYY-MM-DD, or YYYY-MM meaning the month's last day. */
  readonly expiry: string;
  readonly status: LotStatus;
}

export interface Vaccination {
  readonly id: EntityId;
  readonly product: string;
  readonly date: IsoDate;
  readonly birds: number;
}

export interface PlanRequest {
  readonly lots: readonly Lot[];
  readonly vaccinations: readonly Vaccination[];
  /** Site setting; at most two decimals. */
  readonly overagePercent?: number;
}

export interface Allocation {
  readonly lot: EntityId;
  readonly vials: number;
  readonly doses: number;
}

export interface VaccinationPlan {
  readonly id: EntityId;
  readonly dosesNeeded: number;
  readonly allocations: Allocation[];
  readonly dosesAllocated: number;
  readonly dosesWasted: number;
  readonly shortfallDoses: number;
}

export interface LotLeft {
  readonly id: EntityId;
  readonly vials: number;
}

export interface ExpiringLot {
  readonly lot: EntityId;
  readonly vials: number;
  readonly doses: number;
  readonly expiry: IsoDate;
}

export interface Plan {
  readonly vaccinations: VaccinationPlan[];
  readonly lotsLeft: LotLeft[];
  readonly expiringUnused: ExpiringLot[];
}
