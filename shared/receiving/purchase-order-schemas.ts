// Purchase orders entered by purchasing: supplier, expected date, carrier and tracking, and lines of packs.
import { z } from 'zod';
import { isIsoDate } from '../planning/iso-date.js';

export const purchaseOrderStatuses = ['open', 'received', 'cancelled'] as const;
export type PurchaseOrderStatus = (typeof purchaseOrderStatuses)[number];

export const purchaseOrderInputSchema = z.object({
  supplierId: z.number({ message: 'Choose a supplier.' }).int().positive(),
  reference: z.string().trim().min(1, 'Enter the order number.').max(40, 'At most 40 characters.'),
  expectedDate: z.string({ message: 'Enter the expected date.' }).refine(isIsoDate, 'Enter a date (YYYY-MM-DD).'),
  carrier: z.string().trim().max(80, 'At most 80 characters.').default(''),
  trackingNumber: z.string().trim().max(80, 'At most 80 characters.').default(''),
  notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
  lines: z
    .array(
      z.object({
        presentationId: z.number({ message: 'Choose a presentation.' }).int().positive(),
        packs: z.number({ message: 'Enter the packs ordered.' }).int('Whole packs.').min(1, 'At least 1 pack.').max(10_000, 'At most 10,000 packs.'),
      }),
    )
    .min(1, 'Add at least one line.')
    .max(50, 'At most 50 lines.'),
});

export type PurchaseOrderInput = z.infer<typeof purchaseOrderInputSchema>;

export const purchaseOrderListQuerySchema = z.object({
  status: z.enum(purchaseOrderStatuses).optional(),
  siteId: z.coerce.number().int().positive().optional(),
});

export interface PurchaseOrderLineView {
  id: number;
  presentationId: number;
  label: string;
  packs: number;
  vials: number;
}

export interface PurchaseOrderView {
  id: number;
  siteId: number;
  siteName: string;
  supplierId: number;
  supplierName: string;
  reference: string;
  expectedDate: string;
  carrier: string;
  trackingNumber: string;
  notes: string;
  status: PurchaseOrderStatus;
  /** Relative to the site's own calendar day. */
  due: 'overdue' | 'today' | 'later' | null;
  lines: PurchaseOrderLineView[];
}
