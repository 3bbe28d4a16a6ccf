// Vials out and back: a return over the product's time-out limit (or with no limit known) needs the veterinarian.
export interface ReturnCheck {
  minutesOut: number;
  overLimit: boolean;
  /** Why a return hold is needed, or null when the vials go straight back into stock. */
  holdReason: string | null;
}

export function checkReturn(leftFridgeAt: number, backAt: number, limitMinutes: number | null): ReturnCheck {
  const minutesOut = Math.max(0, (backAt - leftFridgeAt) / 60_000);
  if (limitMinutes === null) {
    return { minutesOut, overLimit: true, holdReason: 'No time-out limit is recorded for this product, so the veterinarian decides.' };
  }
  const overLimit = minutesOut > limitMinutes;
  return {
    minutesOut,
    overLimit,
    holdReason: overLimit ? `Out of the fridge ${Math.round(minutesOut)} minutes; the product allows ${limitMinutes}.` : null,
  };
}

export interface Reconciliation {
  issued: number;
  used: number;
  returned: number;
  balanced: boolean;
  /** Vials unaccounted for (positive) or counted twice (negative). */
  difference: number;
}

/** Each vaccination reconciles: vials issued = vials used + vials returned (opened vials are used, never returned). */
export function reconcileVials(issued: number, used: number, returned: number): Reconciliation {
  const difference = issued - used - returned;
  return { issued, used, returned, balanced: difference === 0, difference };
}
