// A lot's status, derived wherever it appears: usable only when every hold is decided in its favour.
export type HoldDecisionKind = 'release' | 'release_with_condition' | 'discard';
export type LotStatus = 'usable' | 'on_hold' | 'expired' | 'discarded' | 'used_up';

export const holdDecisionLabels: Record<HoldDecisionKind, string> = {
  release: 'Release',
  release_with_condition: 'Release with condition',
  discard: 'Discard',
};

/** The words a veterinarian signs: stated once so the record keeps exactly what the signature meant. */
export const signatureMeaning =
  'I have reviewed this lot\'s exposure and decide its use as recorded; the product label and local rules still apply.';

export interface HoldState {
  /** The hold's current decision (the one not superseded), or null while undecided. */
  decision: HoldDecisionKind | null;
}

export function inFavour(decision: HoldDecisionKind | null): boolean {
  return decision === 'release' || decision === 'release_with_condition';
}

export interface LotStatusInput {
  /** YYYY-MM-DD, the last usable day. */
  expiry: string;
  /** YYYY-MM-DD in the lot's site. */
  today: string;
  holds: readonly HoldState[];
  vialsOnHand: number;
  /** Whether vials of the lot were ever discarded by a decision or as expired or damaged. */
  discarded: boolean;
}

export function lotStatus(input: LotStatusInput): LotStatus {
  if (input.vialsOnHand <= 0) return input.discarded ? 'discarded' : 'used_up';
  if (input.holds.some((hold) => !inFavour(hold.decision))) return 'on_hold';
  if (input.today > input.expiry) return 'expired';
  return 'usable';
}
