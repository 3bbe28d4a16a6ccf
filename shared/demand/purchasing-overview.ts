// The purchasing home across the user's sites: shortfalls first, then orders to place, then expiring stock, then open orders.
import type { BelowSafetyAlert, ExpireUnusedAlert, ExpiringAlert, ReorderSuggestion, UncoveredAlert } from './projection-types.js';
import type { SentOrderView } from './sent-order-view.js';

/**
 * Each list holds its most urgent few: a company of many sites has thousands of uncovered vaccinations, the home card
 * shows a handful and each site's purchasing page has the rest. The totals count every item.
 */
export const OVERVIEW_LIST_LIMIT = 20;

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
  totals: {
    shortfalls: number;
    ordersToPlace: number;
    expiring: number;
    expireUnused: number;
    /** Lots that expire soon or before use, each lot once though it may be in both lists. */
    expiringLots: number;
    belowSafety: number;
    openOrders: number;
  };
}
