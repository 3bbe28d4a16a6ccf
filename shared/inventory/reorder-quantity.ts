// How much to order: the shortfall plus safety stock in doses, rounded up to whole vials and then whole packs.
import { DEFAULT_VIALS_PER_PACK, roundUpToPacks, vialsForDoses } from './pack-rounding.js';
import { safetyStockDoses, type SafetyStock } from './safety-stock.js';

export interface ReorderQuantityInput {
  readonly shortfallDoses: number;
  readonly safetyStock: SafetyStock;
  readonly dosesPerVial: number;
  readonly vialsPerPack?: number;
}

export interface ReorderQuantity {
  /** Shortfall plus safety stock, before rounding. */
  readonly dosesRequired: number;
  readonly vialsRequired: number;
  readonly packs: number;
  /** What is actually ordered: packs × vials per pack. */
  readonly vials: number;
  readonly doses: number;
}

export function reorderQuantity(input: ReorderQuantityInput): ReorderQuantity {
  if (!Number.isSafeInteger(input.shortfallDoses) || input.shortfallDoses < 0) {
    throw new RangeError(`shortfall doses must be a whole number ≥ 0, got ${input.shortfallDoses}`);
  }
  const dosesRequired = input.shortfallDoses + safetyStockDoses(input.safetyStock);
  const vialsRequired = vialsForDoses(dosesRequired, input.dosesPerVial);
  const { packs, vials } = roundUpToPacks(vialsRequired, input.vialsPerPack ?? DEFAULT_VIALS_PER_PACK);
  return { dosesRequired, vialsRequired, packs, vials, doses: vials * input.dosesPerVial };
}
