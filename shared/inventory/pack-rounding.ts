// Orders come in whole vials and whole packs (common practice: vials come 10 to a pack).
export const DEFAULT_VIALS_PER_PACK = 10;

/** Whole vials covering `doses`, rounded up. */
export function vialsForDoses(doses: number, dosesPerVial: number): number {
  requireWhole(doses, 0, 'doses');
  requireWhole(dosesPerVial, 1, 'doses per vial');
  return ceilDivide(doses, dosesPerVial);
}

/** 23 vials at 10 a pack → 3 packs, 30 vials. */
export function roundUpToPacks(vials: number, vialsPerPack: number = DEFAULT_VIALS_PER_PACK): { packs: number; vials: number } {
  requireWhole(vials, 0, 'vials');
  requireWhole(vialsPerPack, 1, 'vials per pack');
  const packs = ceilDivide(vials, vialsPerPack);
  return { packs, vials: packs * vialsPerPack };
}

function ceilDivide(numerator: number, divisor: number): number {
  const remainder = numerator % divisor;
  return (numerator - remainder) / divisor + (remainder > 0 ? 1 : 0);
}

function requireWhole(value: number, minimum: number, name: string): void {
  if (!Number.isSafeInteger(value) || value < minimum) throw new RangeError(`${name} must be a whole number ≥ ${minimum}, got ${value}`);
}
