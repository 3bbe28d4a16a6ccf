// A flock's state, derived from its dates: planned before placement, placed until depleted.
import type { IsoDate } from '../planning/iso-date.js';

export const flockStatuses = ['planned', 'placed', 'depleted'] as const;
export type FlockStatus = (typeof flockStatuses)[number];

export const flockStatusLabels: Record<FlockStatus, string> = { planned: 'Planned', placed: 'Placed', depleted: 'Depleted' };

export function flockStatus(flock: { placementDate: IsoDate; depletedOn: IsoDate | null }, today: IsoDate): FlockStatus {
  if (flock.depletedOn !== null && flock.depletedOn <= today) return 'depleted';
  return flock.placementDate > today ? 'planned' : 'placed';
}
