import { expect } from 'chai';
import type { Lot, Vaccination } from '../../../shared/planning/plan-types.js';
import { planVaccinations } from '../../../shared/planning/plan-vaccinations.js';

const lot = (id: string | number, dosesPerVial: number, vials: number, expiry: string, status: Lot['status'] = 'usable', product = 'Product A'): Lot => ({
  id,
  product,
  dosesPerVial,
  vials,
  expiry,
  status,
});
const vaccination = (id: string | number, date: string, birds: number, product = 'Product A'): Vaccination => ({ id, product, date, birds });

describe('planVaccinations', () => {
  it('plans by date, then id, whatever the input order', () => {
    const plan = planVaccinations({
      lots: [lot('L1', 1000, 100, '2026-12-31')],
      vaccinations: [vaccination('v-late', '2026-05-01', 1000), vaccination('b', '2026-04-01', 1000), vaccination('a', '2026-04-01', 1000)],
    });
    expect(plan.vaccinations.map((planned) => planned.id)).to.deep.equal(['a', 'b', 'v-late']);
  });

  it('does not offer vials an earlier vaccination took to a later one', () => {
    const plan = planVaccinations({
      lots: [lot('big', 20_000, 1, '2026-06-30'), lot('small', 1000, 30, '2026-09-30')],
      vaccinations: [vaccination('second', '2026-05-02', 20_000), vaccination('first', '2026-05-01', 20_000)],
    });
    expect(plan.vaccinations[0]!.allocations).to.deep.equal([{ lot: 'big', vials: 1, doses: 20_000 }]);
    expect(plan.vaccinations[1]!.allocations).to.deep.equal([{ lot: 'small', vials: 20, doses: 20_000 }]);
    expect(plan.lotsLeft).to.deep.equal([
      { id: 'big', vials: 0 },
      { id: 'small', vials: 10 },
    ]);
  });

  it('reports the shortfall once stock runs out for a later vaccination', () => {
    const plan = planVaccinations({
      lots: [lot('L1', 1000, 25, '2026-06-30')],
      vaccinations: [vaccination('v1', '2026-05-01', 20_000), vaccination('v2', '2026-05-02', 20_000)],
    });
    expect(plan.vaccinations[1]).to.deep.include({ dosesAllocated: 5000, shortfallDoses: 15_000, dosesWasted: 0 });
  });

  it('ignores held, discarded, expired and other-product lots, so the need is all shortfall', () => {
    const plan = planVaccinations({
      lots: [
        lot('held', 1000, 50, '2026-12-31', 'hold'),
        lot('discarded', 1000, 50, '2026-12-31', 'discarded'),
        lot('expired', 1000, 50, '2026-04-30'),
        lot('other', 1000, 50, '2026-12-31', 'usable', 'Product B'),
      ],
      vaccinations: [vaccination('v1', '2026-05-01', 5000)],
    });
    expect(plan.vaccinations[0]).to.deep.equal({
      id: 'v1',
      dosesNeeded: 5000,
      allocations: [],
      dosesAllocated: 0,
      dosesWasted: 0,
      shortfallDoses: 5000,
    });
  });

  it('uses a lot on its expiry day and treats a month/year expiry as month end (PHAC 2007 §8.2)', () => {
    const plan = planVaccinations({
      lots: [lot('feb', 1000, 10, '2028-02'), lot('on-day', 1000, 10, '2028-03-01')],
      vaccinations: [vaccination('leap-day', '2028-02-29', 2000), vaccination('march-first', '2028-03-01', 3000)],
    });
    expect(plan.vaccinations[0]!.allocations).to.deep.equal([{ lot: 'feb', vials: 2, doses: 2000 }]);
    expect(plan.vaccinations[1]!.allocations).to.deep.equal([{ lot: 'on-day', vials: 3, doses: 3000 }]);
  });

  it('adds the overage exactly: 20,000 birds at 5 % need 21,000 doses', () => {
    const plan = planVaccinations({
      lots: [lot('L1', 1000, 30, '2026-12-31')],
      vaccinations: [vaccination('v1', '2026-05-01', 20_000)],
      overagePercent: 5,
    });
    expect(plan.vaccinations[0]).to.deep.include({ dosesNeeded: 21_000, dosesAllocated: 21_000, dosesWasted: 0 });
  });

  it('counts doses opened beyond the need as wasted', () => {
    const plan = planVaccinations({ lots: [lot('L1', 5000, 4, '2026-12-31')], vaccinations: [vaccination('v1', '2026-05-01', 12_600)] });
    expect(plan.vaccinations[0]).to.deep.include({ dosesAllocated: 15_000, dosesWasted: 2400, shortfallDoses: 0 });
  });

  it('lists usable lots left over that expire before their product’s last vaccination, soonest first', () => {
    const plan = planVaccinations({
      lots: [
        lot('march', 1000, 10, '2026-03-31'),
        lot('jan', 2000, 3, '2026-01-31'),
        lot('held-jan', 1000, 10, '2026-01-31', 'hold'),
        lot('after-last', 1000, 10, '2026-06-30'),
        lot('no-plan', 1000, 10, '2026-01-31', 'usable', 'Product B'),
        lot('used-up', 1000, 1, '2026-01-31'),
      ],
      vaccinations: [vaccination('v1', '2026-01-15', 1000), vaccination('v2', '2026-06-01', 1000)],
    });
    expect(plan.expiringUnused).to.deep.equal([
      { lot: 'jan', vials: 3, doses: 6000, expiry: '2026-01-31' },
      { lot: 'march', vials: 10, doses: 10_000, expiry: '2026-03-31' },
    ]);
  });

  it('keeps numeric and string ids exactly as given', () => {
    const plan = planVaccinations({ lots: [lot(7, 1000, 5, '2026-12-31'), lot('7', 1000, 5, '2026-12-31')], vaccinations: [vaccination(42, '2026-05-01', 6000)] });
    expect(plan.vaccinations[0]!.id).to.equal(42);
    expect(plan.vaccinations[0]!.allocations).to.deep.equal([
      { lot: 7, vials: 5, doses: 5000 },
      { lot: '7', vials: 1, doses: 1000 },
    ]);
    expect(plan.lotsLeft).to.deep.equal([
      { id: 7, vials: 0 },
      { id: '7', vials: 4 },
    ]);
  });

  it('refuses duplicate lot ids rather than guess which lot was meant', () => {
    expect(() => planVaccinations({ lots: [lot('L1', 1000, 5, '2026-12-31'), lot('L1', 1000, 5, '2026-12-31')], vaccinations: [] })).to.throw(
      RangeError,
      /duplicate lot id/,
    );
  });
});
