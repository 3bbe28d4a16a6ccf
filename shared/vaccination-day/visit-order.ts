// The order a crew visits the day's houses: younger flocks before older ones, site by site.
export interface Visit {
  id: number | string;
  siteId: number;
  /** Whatever breaks ties within a site in a stable, human way (the house name). */
  houseName: string;
  flockAgeDays: number;
}

/**
 * Sites in order of the age of the youngest flock to vaccinate there, and within a site the youngest flock
 * first: a crew carries less risk from older birds to younger ones (common practice).
 */
export function visitOrder<V extends Visit>(visits: readonly V[]): V[] {
  const youngestAtSite = new Map<number, number>();
  for (const visit of visits) {
    youngestAtSite.set(visit.siteId, Math.min(youngestAtSite.get(visit.siteId) ?? Infinity, visit.flockAgeDays));
  }
  return [...visits].sort(
    (a, b) =>
      youngestAtSite.get(a.siteId)! - youngestAtSite.get(b.siteId)! ||
      a.siteId - b.siteId ||
      a.flockAgeDays - b.flockAgeDays ||
      a.houseName.localeCompare(b.houseName, undefined, { numeric: true }) ||
      String(a.id).localeCompare(String(b.id), undefined, { numeric: true }),
  );
}
