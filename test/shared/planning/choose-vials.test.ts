import { expect } from 'chai';
import { chooseVials, type VialSource } from '../../../shared/planning/choose-vials.js';
import { dosesNeeded } from '../../../shared/planning/doses-needed.js';

const lot = (id: string | number, dosesPerVial: number, vials: number, expiry: string): VialSource => ({ id, dosesPerVial, vials, expiry });

describe('chooseVials', () => {
  it('gives a 20,000-bird house one 20,000-dose vial (common practice: one dose per bird)', () => {
    const chosen = chooseVials(dosesNeeded(20_000), [lot('L1', 20_000, 5, '2026-06-30')]);
    expect(chosen).to.deep.equal([{ lot: 'L1', vials: 1, doses: 20_000 }]);
  });

  it('returns nothing when no doses are needed or no lot has vials', () => {
    expect(chooseVials(0, [lot('L1', 1000, 5, '2026-06-30')])).to.deep.equal([]);
    expect(chooseVials(5000, [lot('L1', 1000, 0, '2026-06-30')])).to.deep.equal([]);
  });

  it('takes every vial when the stock cannot cover the need (rule 1: least shortfall)', () => {
    const chosen = chooseVials(30_000, [lot('late', 5000, 2, '2026-09-30'), lot('early', 1000, 3, '2026-03-31')]);
    expect(chosen).to.deep.equal([
      { lot: 'early', vials: 3, doses: 3000 },
      { lot: 'late', vials: 2, doses: 10_000 },
    ]);
  });

  it('opens a late 20,000-dose vial rather than fall 2,000 short on early small vials (rule 1 before rules 2 and 3)', () => {
    const chosen = chooseVials(12_000, [lot('early', 5000, 2, '2026-03-31'), lot('late', 20_000, 1, '2026-09-30')]);
    expect(chosen).to.deep.equal([{ lot: 'late', vials: 1, doses: 20_000 }]);
  });

  it('avoids opening unneeded doses even if that takes less from the earliest expiry (rule 2 before rule 3)', () => {
    // Two early 5,000 vials would use more early stock but open 4,000 doses nobody needs.
    const chosen = chooseVials(6000, [lot('early', 5000, 2, '2026-03-31'), lot('late', 1000, 10, '2026-09-30')]);
    expect(chosen).to.deep.equal([
      { lot: 'early', vials: 1, doses: 5000 },
      { lot: 'late', vials: 1, doses: 1000 },
    ]);
  });

  it('skips the earliest lot entirely when using it would force waste, unlike a first-expiry-first greedy', () => {
    const chosen = chooseVials(6000, [lot('early', 4000, 1, '2026-03-31'), lot('late', 3000, 2, '2026-09-30')]);
    expect(chosen).to.deep.equal([{ lot: 'late', vials: 2, doses: 6000 }]);
  });

  it('takes ten early 1,000-dose vials over one late 10,000-dose vial (rule 3 before rule 4)', () => {
    const chosen = chooseVials(10_000, [lot('late', 10_000, 1, '2026-09-30'), lot('early', 1000, 10, '2026-03-31')]);
    expect(chosen).to.deep.equal([{ lot: 'early', vials: 10, doses: 10_000 }]);
  });

  it('after the earliest date, prefers the choice taking more from the next date (rule 3 compares date by date)', () => {
    const chosen = chooseVials(10_000, [
      lot('first', 4000, 1, '2026-01-31'),
      lot('second', 3000, 3, '2026-02-28'),
      lot('third', 1000, 10, '2026-03-31'),
    ]);
    expect(chosen).to.deep.equal([
      { lot: 'first', vials: 1, doses: 4000 },
      { lot: 'second', vials: 2, doses: 6000 },
    ]);
  });

  it('uses the fewest vials among equally dated choices (rule 4)', () => {
    const chosen = chooseVials(10_000, [lot('small', 1000, 10, '2026-03-31'), lot('large', 5000, 2, '2026-03-31')]);
    expect(chosen).to.deep.equal([{ lot: 'large', vials: 2, doses: 10_000 }]);
  });

  it('breaks remaining ties by taking from the lowest lot id first, numbers before strings', () => {
    expect(chooseVials(3000, [lot('lot-b', 1000, 5, '2026-03-31'), lot('lot-a', 1000, 5, '2026-03-31')])).to.deep.equal([
      { lot: 'lot-a', vials: 3, doses: 3000 },
    ]);
    expect(chooseVials(7000, [lot('1', 1000, 5, '2026-03-31'), lot(10, 1000, 5, '2026-03-31'), lot(9, 1000, 5, '2026-03-31')])).to.deep.equal([
      { lot: 9, vials: 5, doses: 5000 },
      { lot: 10, vials: 2, doses: 2000 },
    ]);
  });

  it('plans a large need with hundreds of vials exactly, hand-computed', () => {
    const chosen = chooseVials(dosesNeeded(437_000, 500), [
      lot('a', 1000, 300, '2026-04-30'),
      lot('b', 2500, 400, '2026-04-30'),
      lot('c', 10_000, 200, '2026-05-31'),
    ]);
    // Need 458,850; totals are multiples of 500, so 459,000 wastes least. The April lots alone make it as
    // 1000x + 2500y = 459,000, i.e. x = 459 − 5m, y = 2m; fewest vials (459 − 3m) means the largest m, 91.
    expect(chosen).to.deep.equal([
      { lot: 'a', vials: 4, doses: 4000 },
      { lot: 'b', vials: 182, doses: 455_000 },
    ]);
  });

  it('rejects a lot with zero doses per vial', () => {
    expect(() => chooseVials(1000, [lot('bad', 0, 5, '2026-03-31')])).to.throw(RangeError, /doses per vial/);
  });
});
