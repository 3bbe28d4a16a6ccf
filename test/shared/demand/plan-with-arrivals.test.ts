import { expect } from 'chai';
import { planWithArrivals } from '../../../shared/demand/plan-with-arrivals.js';
import type { Lot, Vaccination } from '../../../shared/planning/plan-types.js';
import { planVaccinations } from '../../../shared/planning/plan-vaccinations.js';

// Seeded so a failing case can be reproduced from its number.
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

function randomCase(random: () => number): { lots: Lot[]; vaccinations: Vaccination[] } {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;
  const lots: Lot[] = Array.from({ length: 1 + Math.floor(random() * 5) }, (_, i) => ({
    id: pick([i + 1, `lot-${i}`]),
    product: pick(['A', 'B']),
    dosesPerVial: pick([1000, 2000, 2500, 5000, 10_000]),
    vials: Math.floor(random() * 8),
    expiry: pick(['2026-04-30', '2026-05-31', '2026-06', '2026-08-15']),
    status: pick(['usable', 'usable', 'usable', 'hold', 'discarded'] as const),
  }));
  const vaccinations: Vaccination[] = Array.from({ length: 1 + Math.floor(random() * 5) }, (_, i) => ({
    id: pick([i + 10, `v-${i}`]),
    product: pick(['A', 'B']),
    date: pick(['2026-04-10', '2026-05-01', '2026-05-31', '2026-06-01', '2026-07-01']),
    birds: Math.floor(random() * 30_000),
  }));
  return { lots, vaccinations };
}

describe('planWithArrivals', () => {
  it('with every lot on hand, gives exactly the planner’s plan on 500 seeded random cases', () => {
    const random = mulberry32(20261202);
    for (let caseNumber = 0; caseNumber < 500; caseNumber++) {
      const request = { ...randomCase(random), overagePercent: [0, 5, 2.5][caseNumber % 3]! };
      expect(planWithArrivals(request), `case ${caseNumber}: ${JSON.stringify(request)}`).to.deep.equal(planVaccinations(request));
    }
  });

  it('keeps a lot from serving vaccinations before it arrives, and lets it serve those after (hand-computed)', () => {
    const plan = planWithArrivals({
      lots: [{ id: 'order-1', product: 'A', dosesPerVial: 20_000, vials: 2, expiry: '9999-12-31', status: 'usable', availableFrom: '2026-05-10' }],
      vaccinations: [
        { id: 1, product: 'A', date: '2026-05-09', birds: 20_000 },
        { id: 2, product: 'A', date: '2026-05-10', birds: 20_000 },
      ],
    });
    expect(plan.vaccinations.map((v) => v.shortfallDoses)).to.deep.equal([20_000, 0]);
    expect(plan.lotsLeft).to.deep.equal([{ id: 'order-1', vials: 1 }]);
  });

  it('still takes from stock on hand first in the planner’s order: what an early vaccination takes is gone for a later one', () => {
    const plan = planWithArrivals({
      lots: [
        { id: 1, product: 'A', dosesPerVial: 10_000, vials: 2, expiry: '2026-12-31', status: 'usable' },
        { id: 2, product: 'A', dosesPerVial: 10_000, vials: 2, expiry: '2026-12-31', status: 'usable', availableFrom: '2026-06-01' },
      ],
      vaccinations: [
        { id: 7, product: 'A', date: '2026-05-01', birds: 20_000 },
        { id: 8, product: 'A', date: '2026-06-02', birds: 20_000 },
      ],
    });
    expect(plan.vaccinations.map((v) => v.allocations)).to.deep.equal([[{ lot: 1, vials: 2, doses: 20_000 }], [{ lot: 2, vials: 2, doses: 20_000 }]]);
  });
});
