// The projection as the API sends it: the site's plan with its planned transfers, borrowing options and stock settings.
import type { ProductStockSettingsView, PlannedTransferView } from './demand-schemas.js';
import type { SiteProjection } from './projection-types.js';
import type { SentOrderView } from './sent-order-view.js';
import type { TransferCandidate } from './transfer-candidates.js';

export interface SiteProjectionView extends SiteProjection {
  siteId: number;
  siteName: string;
  siteCode: string;
  horizonDays: number;
  transfers: PlannedTransferView[];
  /** Per short product: other sites' spare lots that a planned transfer could bring. */
  borrowing: { productId: number; productName: string; candidates: TransferCandidate[] }[];
  settings: ProductStockSettingsView[];
  /** A free order number to start a purchase order with. */
  nextReference: string;
  openOrders: SentOrderView[];
}
