// The purchasing home: every visible site's alerts and suggestions in one list each, most urgent first.
import type { PurchasingOverview } from '../../shared/demand/purchasing-overview.js';
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
  return {
    shortfalls: views.flatMap((v) => tag(v.alerts.uncovered, v)).sort((a, b) => a.plannedDate.localeCompare(b.plannedDate)),
    ordersToPlace: views.flatMap((v) => tag(v.suggestions, v)).sort((a, b) => a.orderBy.localeCompare(b.orderBy)),
    expiring: views.flatMap((v) => tag(v.alerts.expiring, v)).sort((a, b) => a.expiry.localeCompare(b.expiry)),
    expireUnused: views.flatMap((v) => tag(v.alerts.expireUnused, v)).sort((a, b) => a.expiry.localeCompare(b.expiry)),
    belowSafety: views.flatMap((v) => tag(v.alerts.belowSafety, v)).sort((a, b) => a.from.localeCompare(b.from)),
    openOrders: views.flatMap((v) => v.openOrders).sort((a, b) => a.expectedDate.localeCompare(b.expectedDate)),
  };
}
