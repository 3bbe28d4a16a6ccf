// A purchase order as purchasing sees it: the order, and whether and when it went to the supplier.
import type { PurchaseOrderView } from '../receiving/purchase-order-schemas.js';

export interface SentOrderView extends PurchaseOrderView {
  /** The last sending: when, to which address, and whether the mail server took it; null when never sent. */
  lastSent: { at: string; to: string; mailed: boolean } | null;
}
