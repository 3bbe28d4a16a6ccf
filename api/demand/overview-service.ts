// The purchasing home: every visible site's alerts and suggestions in one list each, most urgent first.
import { OVERVIEW_LIST_LIMIT, type PurchasingOverview } from '../../shared/demand/purchasing-overview.js';
import type { SiteProjectionView } from '../../shared/demand/projection-view.js';
import { projectSites } from './projection-service.js';

/** One overview per cached set of views (a new data version or day makes a new set). */
const overviews = new WeakMap<SiteProjectionView[], PurchasingOverview>();

export async function purchasingOverview(user: Express.User, now = new Date()): Promise<PurchasingOverview> {
  const views = await projectSites(user, 'all', now);
  let overview = overviews.get(views);
  if (!overview) {
    overview = overviewOf(views);
    overviews.set(views, overview);
  }
  return overview;
}

function overviewOf(views: SiteProjectionView[]): PurchasingOverview {
  const tag = <T>(items: T[], site: { siteId: number; siteName: string }) => items.map((item) => ({ ...item, siteId: site.siteId, siteName: site.siteName }));
  const shortfalls = views.flatMap((v) => tag(v.alerts.uncovered, v)).sort((a, b) => a.plannedDate.localeCompare(b.plannedDate));
  const ordersToPlace = views.flatMap((v) => tag(v.suggestions, v)).sort((a, b) => a.orderBy.localeCompare(b.orderBy));
  const expiring = views.flatMap((v) => tag(v.alerts.expiring, v)).sort((a, b) => a.expiry.localeCompare(b.expiry));
  const expireUnused = views.flatMap((v) => tag(v.alerts.expireUnused, v)).sort((a, b) => a.expiry.localeCompare(b.expiry));
  const belowSafety = views.flatMap((v) => tag(v.alerts.belowSafety, v)).sort((a, b) => a.from.localeCompare(b.from));
  const openOrders = views.flatMap((v) => v.openOrders).sort((a, b) => a.expectedDate.localeCompare(b.expectedDate));
  const expiringLots = new Set([...expiring, ...expireUnused].map((a) => `${a.siteId}-${a.lotId}`)).size;
  const first = <T>(items: T[]) => items.slice(0, OVERVIEW_LIST_LIMIT);
  return {
    shortfalls: first(shortfalls),
    ordersToPlace: first(ordersToPlace),
    expiring: first(expiring),
    expireUnused: first(expireUnused),
    belowSafety: first(belowSafety),
    openOrders: first(openOrders),
    totals: {
      shortfalls: shortfalls.length,
      ordersToPlace: ordersToPlace.length,
      expiring: expiring.length,
      expireUnused: expireUnused.length,
      expiringLots,
      belowSafety: belowSafety.length,
      openOrders: openOrders.length,
    },
  };
}
