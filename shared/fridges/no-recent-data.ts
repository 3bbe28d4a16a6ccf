// A fridge whose newest reading is older than the site's setting shows as "no recent data".

export function hasNoRecentData(newestReadingMs: number | null, nowMs: number, staleDataHours: number): boolean {
  return newestReadingMs === null || nowMs - newestReadingMs > staleDataHours * 3_600_000;
}
