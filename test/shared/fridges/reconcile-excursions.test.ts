import { expect } from 'chai';
import { reconcileExcursions, type StoredExcursion } from '../../../shared/fridges/reconcile-excursions.js';
import type { Excursion } from '../../../shared/logs/excursion.js';

const MIN = 60_000;
const computed = (start: number, end: number, peakC = 9, kind: 'high' | 'low' = 'high'): Excursion => ({
  kind, start: start * MIN, end: end * MIN, minutes: end - start, peakC, degreeMinutesC: 1, openEnded: false,
});
const stored = (id: number, start: number, end: number, status: StoredExcursion['status'] = 'open', peakC = 9): StoredExcursion => ({
  id, kind: 'high', start: start * MIN, end: end * MIN, minutes: end - start, peakC, status, followUpOfId: null,
});

// These are our own rules (hand-computed cases): undecided records follow the data, decided ones never change.
describe('reconcileExcursions', () => {
  it('opens a record for an excursion no record covers', () => {
    expect(reconcileExcursions([computed(0, 20)], [])).to.deep.equal({ updates: [], inserts: [{ excursion: computed(0, 20), followUpOfId: null }], deletes: [] });
  });

  it('updates the undecided record it overlaps, keeping its id', () => {
    const plan = reconcileExcursions([computed(0, 40)], [stored(7, 0, 20)]);
    expect(plan.updates).to.deep.equal([{ id: 7, excursion: computed(0, 40), followUpOfId: null }]);
    expect(plan.inserts).to.deep.equal([]);
  });

  it('merges two undecided records an excursion now joins into the earlier one, removing the other', () => {
    const plan = reconcileExcursions([computed(0, 60)], [stored(8, 40, 60), stored(7, 0, 20)]);
    expect(plan.updates.map((u) => u.id)).to.deep.equal([7]);
    expect(plan.deletes).to.deep.equal([8]);
  });

  it('opens a follow-up when new data changes a decided excursion, and nothing when it is unchanged', () => {
    expect(reconcileExcursions([computed(0, 40)], [stored(3, 0, 20, 'decided')]).inserts).to.deep.equal([{ excursion: computed(0, 40), followUpOfId: 3 }]);
    expect(reconcileExcursions([computed(0, 20)], [stored(3, 0, 20, 'decided')])).to.deep.equal({ updates: [], inserts: [], deletes: [] });
    expect(reconcileExcursions([computed(0, 20, 9.5)], [stored(3, 0, 20, 'decided')]).inserts).to.have.length(1); // a higher peak
  });

  it('updates an open follow-up rather than opening another', () => {
    const followUp = { ...stored(4, 0, 40), followUpOfId: 3 };
    const plan = reconcileExcursions([computed(0, 60)], [stored(3, 0, 20, 'decided'), followUp]);
    expect(plan.updates).to.deep.equal([{ id: 4, excursion: computed(0, 60), followUpOfId: 3 }]);
    expect(plan.inserts).to.deep.equal([]);
  });

  it('treats a record in review as undecided, and removes undecided records the data no longer shows', () => {
    expect(reconcileExcursions([computed(0, 30)], [stored(5, 0, 20, 'in_review')]).updates.map((u) => u.id)).to.deep.equal([5]);
    expect(reconcileExcursions([], [stored(5, 0, 20), stored(6, 30, 40, 'decided')])).to.deep.equal({ updates: [], inserts: [], deletes: [5] });
  });

  it('never matches a high excursion to a low record', () => {
    const plan = reconcileExcursions([computed(0, 20, 1, 'low')], [stored(5, 0, 20)]);
    expect(plan.inserts).to.have.length(1);
    expect(plan.deletes).to.deep.equal([5]);
  });
});
