// The lots list's statuses and sorts with their words (zod-free, for the client's filter form).
import type { LotStatus } from './lot-status.js';

export const lotStatuses = ['usable', 'on_hold', 'expired', 'discarded', 'used_up'] as const satisfies readonly LotStatus[];

export const lotStatusLabels: Record<LotStatus, string> = {
  usable: 'Usable',
  on_hold: 'On hold',
  expired: 'Expired',
  discarded: 'Discarded',
  used_up: 'Used up',
};

/** Sorts the list accepts; a leading minus reverses. Earliest expiry first is the default (first-expired, first-out). */
export const lotSorts = ['expiry', '-expiry', 'lotNumber', '-lotNumber', 'product', '-product', 'vials', '-vials'] as const;
export type LotSort = (typeof lotSorts)[number];

export const lotSortLabels: Record<LotSort, string> = {
  expiry: 'Earliest expiry first',
  '-expiry': 'Latest expiry first',
  lotNumber: 'Lot number A–Z',
  '-lotNumber': 'Lot number Z–A',
  product: 'Product A–Z',
  '-product': 'Product Z–A',
  vials: 'Fewest vials first',
  '-vials': 'Most vials first',
};
