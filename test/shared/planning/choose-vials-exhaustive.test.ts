import { expect } from 'chai';
import { chooseVials, type VialSource } from '../../../shared/planning/choose-vials.js';
import { compareIds, type EntityId } from '../../../shared/planning/entity-id.js';

// Seeded so a failure is reproducible: the case number identifies it.
function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The rules written out as one cost tuple, smaller is better, compared element by element. */
function cost(needed: number, lots: readonly VialSource[], taken: readonly number[]): number[] {
  const total = lots.reduce((sum, lot, i) => sum + taken[i]! * lot.dosesPerVial, 0);
  const dates = [...new Set(lots.map((lot) => lot.expiry))].sort();
  const perDate = dates.map((date) => -lots.reduce((sum, lot, i) => sum + (lot.expiry === date ? taken[i]! * lot.dosesPerVial : 0), 0));
  const vials = taken.reduce((sum, count) => sum + count, 0);
  const byId = lots.map((lot, i) => ({ id: lot.id, taken: taken[i]! })).sort((a, b) => compareIds(a.id, b.id));
  return [Math.max(0, needed - total), Math.max(0, total - needed), ...perDate, vials, ...byId.map((entry) => -entry.taken)];
}

function lexLess(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! < b[i]!;
  return false;
}

function bruteForce(needed: number, lots: readonly VialSource[]): number[] {
  let best: number[] | undefined;
  let bestCost: number[] | undefined;
  const taken = lots.map(() => 0);
  const visit = (i: number): void => {
    if (i === lots.length) {
      const candidate = cost(needed, lots, taken);
      if (!bestCost || lexLess(candidate, bestCost)) [best, bestCost] = [[...taken], candidate];
      return;
    }
    for (let count = 0; count <= lots[i]!.vials; count++) {
      taken[i] = count;
      visit(i + 1);
    }
  };
  visit(0);
  return best!;
}

function randomCase(random: () => number): { needed: number; lots: VialSource[] } {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;
  // Few lots with many vials, or more lots with few, keeps brute force small; [1000, 1001, …] forces a 1-dose unit.
  const manyVials = random() < 0.3;
  const lotCount = manyVials ? 1 + Math.floor(random() * 3) : 1 + Math.floor(random() * 5);
  const maxVials = manyVials ? 9 : 3;
  const sizes = pick([[1000, 2000, 5000], [1000, 2500], [2000, 3000, 7000], [500, 1000, 1500, 4000], [1000, 1001, 1500, 2999]]);
  const ids: EntityId[] = pick([['a', 'b', 'c', 'd', 'e'], [5, 3, 1, 4, 2], ['x', 2, 'b', 10, 'a']]);
  const lots = Array.from({ length: lotCount }, (_, i) => ({
    id: ids[i]!,
    dosesPerVial: pick(sizes),
    vials: Math.floor(random() * (maxVials + 1)),
    expiry: pick(['2026-01-31', '2026-02-28', '2026-03-31']),
  }));
  const capacity = lots.reduce((sum, lot) => sum + lot.vials * lot.dosesPerVial, 0);
  const needed = Math.floor(random() * (capacity + 3000));
  return { needed, lots };
}

describe('chooseVials against exhaustive search', () => {
  it('matches the brute-force optimum on 800 seeded random small cases, vial for vial', () => {
    const random = mulberry32(20260301);
    for (let caseNumber = 0; caseNumber < 800; caseNumber++) {
      const { needed, lots } = randomCase(random);
      const expected = bruteForce(needed, lots);
      const chosen = chooseVials(needed, lots);
      const actual = lots.map((lot) => chosen.find((allocation) => allocation.lot === lot.id)?.vials ?? 0);
      expect(actual, `case ${caseNumber}: need ${needed} from ${JSON.stringify(lots)}`).to.deep.equal(expected);
    }
  });

  it('reports doses as vials × doses per vial and never more vials than a lot has', () => {
    const random = mulberry32(7);
    for (let caseNumber = 0; caseNumber < 200; caseNumber++) {
      const { needed, lots } = randomCase(random);
      for (const allocation of chooseVials(needed, lots)) {
        const lot = lots.find((candidate) => candidate.id === allocation.lot)!;
        expect(allocation.vials, `case ${caseNumber}`).to.be.within(1, lot.vials);
        expect(allocation.doses).to.equal(allocation.vials * lot.dosesPerVial);
      }
    }
  });
});
