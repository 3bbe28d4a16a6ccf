// The kinds of stock movement, in whole vials (the database checks which fridges each names).
export const movementKinds = ['receive', 'transfer', 'issue', 'return', 'discard', 'adjust'] as const;
export type MovementKind = (typeof movementKinds)[number];

