// The lots list: its query (search, filters, a whitelisted sort, pages) and the rows it returns.
import { z } from 'zod';
import type { HoldCause } from './hold-causes.js';
import type { LotStatus } from './lot-status.js';
import { lotSorts, lotStatuses } from './lot-list-options.js';

const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'A date as YYYY-MM-DD.');
const id = z.coerce.number().int().positive();

export const lotListQuerySchema = z
  .object({
    q: z.string().trim().max(20, 'At most 20 characters.').default(''),
    productId: id.optional(),
    siteId: id.optional(),
    fridgeId: id.optional(),
    status: z.enum(lotStatuses, { message: `One of ${lotStatuses.join(', ')}.` }).optional(),
    expiryFrom: isoDay.optional(),
    expiryTo: isoDay.optional(),
    sort: z.enum(lotSorts, { message: `One of ${lotSorts.join(', ')}.` }).default('expiry'),
    page: z.coerce.number().int().min(1).max(10_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(100).default(25),
  })
  .refine((q) => !q.expiryFrom || !q.expiryTo || q.expiryFrom <= q.expiryTo, { path: ['expiryTo'], message: 'On or after the "from" date.' });
export type LotListQuery = z.infer<typeof lotListQuerySchema>;

export interface LotListItem {
  id: number;
  lotNumber: string;
  expiry: string;
  expiryDayGiven: boolean;
  productId: number;
  product: string;
  dosesPerVial: number;
  /** Vials on the user's sites (narrowed to the site or fridge filtered on). */
  vials: number;
  status: LotStatus;
  holdCauses: HoldCause[];
  sites: { id: number; name: string }[];
}

export interface LotListPage {
  items: LotListItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface LotFilterOptions {
  products: { id: number; name: string }[];
  sites: { id: number; name: string }[];
  /** With the site's zone: a transfer's arrival time is typed on the receiving fridge's site's clock. */
  fridges: { id: number; code: string; name: string; siteId: number; timeZone: string }[];
}
