// The purchasing home across the user's sites: shortfalls first, then orders to place, then expiring stock, then open orders.
import type { BelowSafetyAlert, ExpireUnusedAlert, ExpiringAlert, ReorderSuggestion, UncoveredAlert } from './projection-types.js';
import type { SentOrderView } from './sent-order-view.js';

export interface AtSite {
  siteId: number;
  siteName: string;
}

export interface PurchasingOverview {
  shortfalls: (UncoveredAlert & AtSite)[];
  ordersToPlace: (ReorderSuggestion & AtSite)[];
  expiring: (ExpiringAlert & AtSite)[];
  expireUnused: (ExpireUnusedAlert & AtSite)[];
  belowSafety: (BelowSafetyAlert & AtSite)[];
  openOrders: SentOrderView[];
}
