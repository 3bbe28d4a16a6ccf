// Where a short site could borrow from: other sites' usable lots of the product with vials their own plan leaves over.
import type { IsoDate } from '../planning/iso-date.js';

export interface SpareLot {
  readonly siteId: number;
  readonly siteName: string;
  readonly lotId: number;
  readonly lotNumber: string;
  readonly productId: number;
  readonly dosesPerVial: number;
  readonly expiry: IsoDate;
  /** Vials left after the site's own projected vaccinations. */
  readonly spareVials: number;
}

export interface TransferCandidate extends SpareLot {
  /** Vials that would cover the shortfall, at most the spare ones. */
  readonly suggestedVials: number;
}

/** Lots still in date on the first short day, earliest expiry first (they are the ones to move), then lot id. */
export function transferCandidates(shortage: { productId: number; firstShortfallDate: IsoDate; shortfallDoses: number }, spare: readonly SpareLot[]): TransferCandidate[] {
  return spare
    .filter((lot) => lot.productId === shortage.productId && lot.spareVials > 0 && lot.expiry >= shortage.firstShortfallDate)
    .sort((a, b) => a.expiry.localeCompare(b.expiry) || a.lotId - b.lotId)
    .map((lot) => ({ ...lot, suggestedVials: Math.min(lot.spareVials, Math.ceil(shortage.shortfallDoses / lot.dosesPerVial)) }));
}
