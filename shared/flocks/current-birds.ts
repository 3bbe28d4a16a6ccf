// Birds in a flock now: the birds placed, less each mortality update, reset by each headcount, in date order.
import type { IsoDate } from '../planning/iso-date.js';
import type { BirdCountKind } from './bird-count-kinds.js';

export interface BirdCountEntry {
  readonly id: number;
  readonly countedOn: IsoDate;
  readonly kind: BirdCountKind;
  readonly birds: number;
}

/** Each entry with the birds left after it, oldest first (same day: in the order recorded). */
export function birdHistory<T extends BirdCountEntry>(birdsPlaced: number, entries: readonly T[]): (T & { birdsAfter: number })[] {
  let birds = birdsPlaced;
  return [...entries]
    .sort((a, b) => (a.countedOn < b.countedOn ? -1 : a.countedOn > b.countedOn ? 1 : a.id - b.id))
    .map((entry) => {
      birds = entry.kind === 'count' ? entry.birds : birds - entry.birds;
      return { ...entry, birdsAfter: birds };
    });
}

export function currentBirds(birdsPlaced: number, entries: readonly BirdCountEntry[]): number {
  const history = birdHistory(birdsPlaced, entries);
  return history.length ? history[history.length - 1]!.birdsAfter : birdsPlaced;
}

/** The first entry after which the flock would count fewer than zero birds, if any: the update to refuse. */
export function firstNegativeEntry<T extends BirdCountEntry>(birdsPlaced: number, entries: readonly T[]): (T & { birdsAfter: number }) | null {
  return birdHistory(birdsPlaced, entries).find((entry) => entry.birdsAfter < 0) ?? null;
}
