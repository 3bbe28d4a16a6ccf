// Lots that will still hold vials when they expire, because their product's last planned vaccination comes after the expiry.
import { compareIds } from './entity-id.js';
import type { IsoDate } from './iso-date.js';
import type { ExpiringLot, Lot, Vaccination } from './plan-types.js';

/** `lots[i]` has `vialsLeft[i]` vials after planning and a full-date expiry; soonest expiry first, then lot id. */
export function expiringUnused(
  lots: readonly (Lot & { readonly expiry: IsoDate })[],
  vialsLeft: readonly number[],
  vaccinations: readonly Vaccination[],
): ExpiringLot[] {
  const lastDate = new Map<string, IsoDate>();
  for (const vaccination of vaccinations) {
    const last = lastDate.get(vaccination.product);
    if (last === undefined || vaccination.date > last) lastDate.set(vaccination.product, vaccination.date);
  }
  return lots
    .flatMap((lot, i) => {
      const last = lastDate.get(lot.product);
      const vials = vialsLeft[i]!;
      const stranded = lot.status === 'usable' && vials > 0 && last !== undefined && lot.expiry < last;
      return stranded ? [{ lot: lot.id, vials, doses: vials * lot.dosesPerVial, expiry: lot.expiry }] : [];
    })
    .sort((a, b) => (a.expiry < b.expiry ? -1 : a.expiry > b.expiry ? 1 : compareIds(a.lot, b.lot)));
}
