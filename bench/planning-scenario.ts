// A large, repeatable planning input: many flocks on a vaccination programme over 180 days against a stock of lots.
import type { PlanRequest } from '../shared/planning/plan-types.js';
import { addDays } from '../shared/planning/iso-date.js';

/** A small deterministic PRNG (mulberry32) so every run plans the same farm. */
function random(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const products = ['Product A', 'Product B', 'Product C', 'Product D', 'Product E', 'Product F', 'Product G', 'Product H'];
const vialSizes = [1_000, 2_000, 5_000, 10_000, 20_000];
/** Ages in days at which the invented programme gives each product. */
const programme = [1, 10, 18, 28, 42, 56, 70, 84, 98, 112, 126];

export function planningScenario(flocks: number, horizonDays = 180, start = '2026-12-01', lots = 1_000): PlanRequest {
  const next = random(flocks * 7919 + lots);
  const vaccinations = [];
  for (let f = 0; f < flocks; f++) {
    const ageAtStart = Math.floor(next() * 400) - 120;
    const birds = 5_000 + Math.floor(next() * 40) * 1_000;
    for (const [step, age] of programme.entries()) {
      const offset = age - ageAtStart;
      if (offset < 0 || offset >= horizonDays) continue;
      vaccinations.push({ id: `${f}-${step}`, product: products[step % products.length], date: addDays(start, offset), birds });
    }
  }
  const stock = [];
  for (let l = 0; l < lots; l++) {
    stock.push({
      id: l + 1,
      product: products[l % products.length],
      dosesPerVial: vialSizes[Math.floor(next() * vialSizes.length)],
      vials: 10 + Math.floor(next() * 90),
      expiry: addDays(start, 30 + Math.floor(next() * 400)),
      status: next() < 0.05 ? ('hold' as const) : ('usable' as const),
    });
  }
  return { lots: stock, vaccinations, overagePercent: 2 };
}
