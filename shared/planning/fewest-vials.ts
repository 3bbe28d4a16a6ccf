// Bounded fewest-coins step: the fewest vials that make each total (in dose units) once one more lot of limited vials is allowed.
export const UNREACHABLE = 0x3fffffff;

/**
 * Linear in the table size: for each residue modulo `unit`, a sliding-window minimum over the last `count + 1`
 * steps replaces trying every vial count.
 */
export function addLotToFewestVials(fewest: Int32Array, unit: number, count: number): Int32Array {
  const size = fewest.length;
  const next = new Int32Array(size).fill(UNREACHABLE);
  const slots = Math.floor((size - 1) / unit) + 1;
  const queueStep = new Int32Array(slots);
  const queueKey = new Int32Array(slots);
  for (let residue = 0; residue < Math.min(unit, size); residue++) {
    let head = 0;
    let tail = 0;
    for (let step = 0, total = residue; total < size; step++, total += unit) {
      const before = fewest[total]!;
      if (before !== UNREACHABLE) {
        // Key before − step makes "vials from earlier lots + vials of this lot" comparable across window positions.
        const key = before - step;
        while (tail > head && queueKey[tail - 1]! >= key) tail--;
        queueStep[tail] = step;
        queueKey[tail] = key;
        tail++;
      }
      while (tail > head && queueStep[head]! < step - count) head++;
      if (tail > head) next[total] = queueKey[head]! + step;
    }
  }
  return next;
}

/** A table where only the empty choice (total 0, no vials) is reachable. */
export function emptyFewestVials(size: number): Int32Array {
  const table = new Int32Array(size).fill(UNREACHABLE);
  table[0] = 0;
  return table;
}
