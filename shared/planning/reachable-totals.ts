// Bounded subset sum as a bitset: which totals (in dose units) lots of limited vials can make together.
/** Bit t is set when total t can be made. */
export type ReachableTotals = Uint32Array;

/** Totals 0..maxTotal (and up to the end of the last word), with only the empty choice, 0, reachable. */
export function emptyReachable(maxTotal: number): ReachableTotals {
  const bits = new Uint32Array((maxTotal >>> 5) + 1);
  bits[0] = 1;
  return bits;
}

export function isReachable(bits: ReachableTotals, total: number): boolean {
  return ((bits[total >>> 5]! >>> (total & 31)) & 1) === 1;
}

/**
 * A new table that also allows 0..count vials of size `unit`. Splitting the count into 1, 2, 4, … vials
 * (whose subsets make every count up to `count` and no more) turns each piece into one shifted OR of 32 totals at a time.
 */
export function addLotToReachable(bits: ReachableTotals, unit: number, count: number): ReachableTotals {
  const next = bits.slice();
  let left = Math.min(count, Math.floor((next.length * 32 - 1) / unit));
  for (let piece = 1; left > 0; piece *= 2) {
    const vials = Math.min(piece, left);
    orShiftedUp(next, vials * unit);
    left -= vials;
  }
  return next;
}

/** bits |= bits << shift, in place: walking down means every word read is still its old value. */
function orShiftedUp(bits: Uint32Array, shift: number): void {
  const wordShift = shift >>> 5;
  const bitShift = shift & 31;
  for (let i = bits.length - 1; i >= wordShift; i--) {
    const source = i - wordShift;
    let moved = bits[source]! << bitShift;
    if (bitShift !== 0 && source > 0) moved |= bits[source - 1]! >>> (32 - bitShift);
    bits[i] = bits[i]! | moved;
  }
}
