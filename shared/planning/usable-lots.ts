// Which lots may serve a vaccination of a product on a given day.
import type { IsoDate } from './iso-date.js';
import type { Lot } from './plan-types.js';

/**
 * Same product, released for use (a hold is undecided, so it cannot be counted on), and still in date on the day.
 * `expiry` must already be a full date (see normalizeExpiry); vials left are the caller's to check.
 */
export function isLotUsableOn(lot: Lot & { readonly expiry: IsoDate }, product: string, date: IsoDate): boolean {
  return lot.product === product && lot.status === 'usable' && lot.expiry >= date;
}
