// The crew's quarantine before vaccination day: no other farm in the 12 hours before the first visit.
export const QUARANTINE_HOURS = 12;

export interface FarmVisit {
  /** The farm (site) visited; null for a farm outside Vialyard. */
  siteId: number | null;
  at: number;
  label?: string;
}

export interface QuarantineResult {
  ok: boolean;
  /** Visits to farms outside today's sheet within the window, earliest first. */
  conflicts: FarmVisit[];
  windowStart: number;
}

/**
 * Visits to the day sheet's own sites do not count (the crew is going there anyway); any other farm within
 * [first visit − 12 h, first visit) fails the check (common practice).
 */
export function twelveHourRule(firstVisitAt: number, sheetSiteIds: readonly number[], visits: readonly FarmVisit[]): QuarantineResult {
  const windowStart = firstVisitAt - QUARANTINE_HOURS * 3_600_000;
  const conflicts = visits
    .filter((v) => v.at >= windowStart && v.at < firstVisitAt && (v.siteId === null || !sheetSiteIds.includes(v.siteId)))
    .sort((a, b) => a.at - b.at);
  return { ok: conflicts.length === 0, conflicts, windowStart };
}
