// Lots on hand that expire soon, by the site's alert windows (30, 60 and 90 days unless set otherwise).
import { daysBetween, type IsoDate } from '../planning/iso-date.js';

/** The smallest window holding an expiry `daysLeft` away; 0 when already expired; null when beyond every window. */
export function expiryWindow(daysLeft: number, windows: readonly number[]): number | null {
  if (daysLeft < 0) return 0;
  const sorted = [...windows].sort((a, b) => a - b);
  return sorted.find((window) => daysLeft <= window) ?? null;
}

export function daysUntilExpiry(today: IsoDate, expiry: IsoDate): number {
  return daysBetween(today, expiry);
}

/** Vials × unit price to the cent; null when the price is unknown. */
export function stockValue(vials: number, unitPrice: number | null): number | null {
  return unitPrice === null ? null : Math.round(vials * unitPrice * 100) / 100;
}
