// Lot and vaccination ids are kept exactly as given (string or number); this gives them one deterministic order.
export type EntityId = string | number;

/** Numbers first, by value; then strings by UTF-16 code units, which unlike localeCompare never depends on the runtime. */
export function compareIds(a: EntityId, b: EntityId): number {
  if (typeof a === 'number' && typeof b === 'number') return a < b ? -1 : a > b ? 1 : 0;
  if (typeof a === 'number') return -1;
  if (typeof b === 'number') return 1;
  return a < b ? -1 : a > b ? 1 : 0;
}
