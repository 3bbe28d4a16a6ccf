// Decides how freshly computed excursions update the stored records: undecided ones follow the data, decided ones never change.
import type { Excursion } from '../logs/excursion.js';
import type { ExcursionStatus } from './excursion-view.js';

export interface StoredExcursion {
  readonly id: number;
  readonly kind: 'high' | 'low';
  readonly start: number;
  readonly end: number;
  readonly minutes: number;
  readonly peakC: number;
  readonly status: ExcursionStatus;
  readonly followUpOfId: number | null;
}

export interface ExcursionPlan {
  /** Undecided records that take the new figures (their id, status and links stay). */
  readonly updates: { id: number; excursion: Excursion; followUpOfId: number | null }[];
  /** New records; `followUpOfId` names the decided excursion the new data touched. */
  readonly inserts: { excursion: Excursion; followUpOfId: number | null }[];
  /** Undecided records the data no longer shows (merged into another, or gone). */
  readonly deletes: number[];
}

const overlaps = (a: { start: number; end: number }, b: { start: number; end: number }) => a.start < b.end && b.start < a.end;

/** The same excursion as decided: new data around it did not change what the veterinarian saw. */
export function sameExcursion(stored: StoredExcursion, computed: Excursion): boolean {
  return (
    stored.kind === computed.kind &&
    Math.abs(stored.start - computed.start) < 1000 &&
    Math.abs(stored.end - computed.end) < 1000 &&
    Math.abs(stored.minutes - computed.minutes) < 0.01 &&
    Math.abs(stored.peakC - computed.peakC) < 0.005
  );
}

/**
 * `computed`: the excursions the readings of a window show now; `stored`: the records of that window made
 * from readings. Each computed excursion takes over the earliest undecided record it overlaps (others it
 * overlaps were merged into it and go); with only decided records under it, it is either the same as one
 * of them (nothing to do) or it opens a follow-up linked to the latest of them.
 */
export function reconcileExcursions(computed: readonly Excursion[], stored: readonly StoredExcursion[]): ExcursionPlan {
  const updates: ExcursionPlan['updates'] = [];
  const inserts: ExcursionPlan['inserts'] = [];
  const claimed = new Set<number>();
  const byStart = [...stored].sort((a, b) => a.start - b.start || a.id - b.id);
  for (const excursion of computed) {
    const under = byStart.filter((s) => s.kind === excursion.kind && overlaps(s, excursion));
    const decided = under.filter((s) => s.status === 'decided');
    const undecided = under.filter((s) => s.status !== 'decided' && !claimed.has(s.id));
    const latestDecided = decided.reduce<StoredExcursion | undefined>((latest, s) => (!latest || s.id > latest.id ? s : latest), undefined);
    if (undecided.length > 0) {
      const kept = undecided[0];
      for (const s of undecided) claimed.add(s.id);
      updates.push({ id: kept.id, excursion, followUpOfId: kept.followUpOfId ?? latestDecided?.id ?? null });
    } else if (latestDecided) {
      if (!decided.some((d) => sameExcursion(d, excursion))) inserts.push({ excursion, followUpOfId: latestDecided.id });
    } else inserts.push({ excursion, followUpOfId: null });
  }
  const deletes = stored.filter((s) => s.status !== 'decided' && !updates.some((u) => u.id === s.id)).map((s) => s.id);
  return { updates, inserts, deletes };
}
