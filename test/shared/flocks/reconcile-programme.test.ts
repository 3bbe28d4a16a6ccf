import { expect } from 'chai';
import { reconcileProgramme, type ReconcileInput, type ReconcileStep } from '../../../shared/flocks/reconcile-programme.js';

const step = (id: number, ageValue: number, ageUnit: 'days' | 'weeks' = 'days', productId = 1): ReconcileStep => ({ id, productId, ageValue, ageUnit, route: 'spray', notes: '' });

// Hand-computed: hatch 2026-01-01, so day 10 is 2026-01-11 and week 4 is 2026-01-29.
const base: ReconcileInput = {
  hatchDate: '2026-01-01',
  placementDate: '2026-01-01',
  lastDay: '2026-12-31',
  today: '2026-01-05',
  steps: [step(1, 10), step(2, 4, 'weeks')],
  existing: [],
};

describe('reconcileProgramme', () => {
  it('generates each step at hatch date + age', () => {
    const changes = reconcileProgramme(base);
    expect(changes.create.map((c) => [c.stepId, c.plannedDate])).to.deep.equal([
      [1, '2026-01-11'],
      [2, '2026-01-29'],
    ]);
  });

  it('skips steps before placement (the hatchery’s or rearing farm’s) and on or after depletion', () => {
    const changes = reconcileProgramme({ ...base, placementDate: '2026-01-20', lastDay: '2026-01-29', steps: [step(1, 10), step(2, 4, 'weeks'), step(3, 25)] });
    expect(changes.create.map((c) => c.stepId)).to.deep.equal([3]);
  });

  it('still generates a step whose day passed before the programme was applied, marked overdue, so a missed one shows', () => {
    // Hand-computed: today 2026-01-12 is after day 10 (2026-01-11) and before week 4 (2026-01-29).
    const changes = reconcileProgramme({ ...base, today: '2026-01-12' });
    expect(changes.create.map((c) => [c.stepId, c.plannedDate, c.overdue])).to.deep.equal([
      [1, '2026-01-11', true],
      [2, '2026-01-29', false],
    ]);
    // Its own day is not overdue yet.
    expect(reconcileProgramme({ ...base, today: '2026-01-11' }).create[0]!.overdue).to.equal(false);
  });

  it('is idempotent: a second run changes nothing', () => {
    const existing = [
      { id: 10, stepId: 1, productId: 1, route: 'spray' as const, plannedDate: '2026-01-11', status: 'planned' as const, movedByHand: false },
      { id: 11, stepId: 2, productId: 1, route: 'spray' as const, plannedDate: '2026-01-29', status: 'planned' as const, movedByHand: false },
    ];
    expect(reconcileProgramme({ ...base, existing })).to.deep.equal({ create: [], update: [], remove: [] });
  });

  it('follows a new hatch date with untouched vaccinations, but leaves moved and confirmed ones alone', () => {
    const existing = [
      { id: 10, stepId: 1, productId: 1, route: 'spray' as const, plannedDate: '2026-01-11', status: 'planned' as const, movedByHand: false },
      { id: 11, stepId: 2, productId: 1, route: 'spray' as const, plannedDate: '2026-02-02', status: 'planned' as const, movedByHand: true },
    ];
    const changes = reconcileProgramme({ ...base, hatchDate: '2026-01-03', existing });
    expect(changes.update).to.deep.equal([{ id: 10, productId: 1, route: 'spray', plannedDate: '2026-01-13' }]);
    expect(changes.create).to.deep.equal([]);
    const confirmed = reconcileProgramme({ ...base, hatchDate: '2026-01-03', existing: [{ ...existing[0]!, status: 'confirmed' }] });
    expect(confirmed.update).to.deep.equal([]);
  });

  it('removes untouched vaccinations of another programme’s steps and keeps the touched ones', () => {
    const existing = [
      { id: 20, stepId: 99, productId: 2, route: 'spray' as const, plannedDate: '2026-01-15', status: 'planned' as const, movedByHand: false },
      { id: 21, stepId: 98, productId: 2, route: 'spray' as const, plannedDate: '2026-01-16', status: 'confirmed' as const, movedByHand: false },
      { id: 22, stepId: null, productId: 2, route: 'spray' as const, plannedDate: '2026-01-17', status: 'planned' as const, movedByHand: true },
    ];
    const changes = reconcileProgramme({ ...base, existing });
    expect(changes.remove).to.deep.equal([20]);
    expect(changes.create).to.have.length(2);
  });

  it('does not bring back a step whose vaccination someone cancelled', () => {
    const existing = [{ id: 30, stepId: 1, productId: 1, route: 'spray' as const, plannedDate: '2026-01-11', status: 'cancelled' as const, movedByHand: false }];
    expect(reconcileProgramme({ ...base, existing }).create.map((c) => c.stepId)).to.deep.equal([2]);
  });

  it('keeps an overdue planned vaccination rather than dropping it', () => {
    const existing = [{ id: 40, stepId: 1, productId: 1, route: 'spray' as const, plannedDate: '2026-01-11', status: 'planned' as const, movedByHand: false }];
    expect(reconcileProgramme({ ...base, today: '2026-01-20', existing }).remove).to.deep.equal([]);
  });
});
