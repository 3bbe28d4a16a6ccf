import { expect } from 'chai';
import { birdCountInputSchema } from '../../../shared/flocks/bird-count-schemas.js';
import { flockInputSchema } from '../../../shared/flocks/flock-schemas.js';
import { programmeInputSchema } from '../../../shared/flocks/programme-schemas.js';
import { withdrawalOverrideSchema } from '../../../shared/flocks/vaccination-schemas.js';

const paths = (result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) => result.error!.issues.map((i) => i.path.join('.'));

describe('flock and programme input schemas', () => {
  const flock = { name: 'H1-26A', hatchDate: '2026-01-01', placementDate: '2026-01-01', birdsPlaced: 20_000, plannedDepletionDate: '2027-04-01' };

  it('accepts a flock and defaults what is optional', () => {
    expect(flockInputSchema.parse(flock)).to.deep.include({ programmeId: null, notes: '' });
  });

  it('names the field when placement precedes hatch, depletion precedes placement, or a date is not a calendar day', () => {
    expect(paths(flockInputSchema.safeParse({ ...flock, placementDate: '2025-12-31' }))).to.deep.equal(['placementDate']);
    expect(paths(flockInputSchema.safeParse({ ...flock, plannedDepletionDate: '2026-01-01' }))).to.deep.equal(['plannedDepletionDate']);
    expect(paths(flockInputSchema.safeParse({ ...flock, hatchDate: '2026-02-30' }))).to.include('hatchDate');
    expect(paths(flockInputSchema.safeParse({ ...flock, birdsPlaced: 0 }))).to.deep.equal(['birdsPlaced']);
  });

  it('refuses a programme step past 150 weeks, and a step listed twice', () => {
    const stepBase = { productId: 1, ageUnit: 'weeks' as const, route: 'spray' as const };
    expect(paths(programmeInputSchema.safeParse({ name: 'P', steps: [{ ...stepBase, ageValue: 151 }] }))).to.deep.equal(['steps.0.ageValue']);
    expect(paths(programmeInputSchema.safeParse({ name: 'P', steps: [{ ...stepBase, id: 4, ageValue: 1 }, { ...stepBase, id: 4, ageValue: 2 }] }))).to.deep.equal(['steps.1.id']);
    expect(paths(programmeInputSchema.safeParse({ name: 'P', steps: [] }))).to.deep.equal(['steps']);
  });

  it('wants a loss of at least one bird, and a reason of a sentence for an override', () => {
    expect(paths(birdCountInputSchema.safeParse({ countedOn: '2026-02-01', kind: 'mortality', birds: 0 }))).to.deep.equal(['birds']);
    expect(birdCountInputSchema.safeParse({ countedOn: '2026-02-01', kind: 'count', birds: 0 }).success).to.equal(true);
    expect(paths(withdrawalOverrideSchema.safeParse({ reason: 'ok' }))).to.deep.equal(['reason']);
  });
});
