import { expect } from 'chai';
import { demandStatistics } from '../../../shared/inventory/demand-statistics.js';
import { proposeSafetyStock } from '../../../shared/inventory/propose-safety-stock.js';

describe('demandStatistics', () => {
  it('uses the sample standard deviation (n − 1): 10, 12, 14, 16, 18 → mean 14, sd √10', () => {
    const statistics = demandStatistics([10, 12, 14, 16, 18]);
    expect(statistics.mean).to.equal(14);
    expect(statistics.sampleSd).to.be.closeTo(Math.sqrt(10), 1e-12);
  });

  it('needs at least two periods to estimate variation', () => {
    expect(() => demandStatistics([5])).to.throw(RangeError, /at least 2/);
  });
});

describe('proposeSafetyStock', () => {
  it('proposes z·s·√LT at 95 %: 1.6449 × √10 × √4 ≈ 10.403, ROP ≈ 66.403 (hand-computed)', () => {
    const proposal = proposeSafetyStock({ history: [10, 12, 14, 16, 18], serviceLevel: 0.95, leadTimePeriods: 4 });
    expect(proposal.z).to.be.closeTo(1.6449, 0.0001);
    expect(proposal.safetyStock).to.be.closeTo(10.403, 0.001);
    expect(proposal.reorderPoint).to.be.closeTo(66.403, 0.001);
  });

  it('proposes no safety stock for perfectly steady demand', () => {
    expect(proposeSafetyStock({ history: [3000, 3000, 3000], serviceLevel: 0.99 }).safetyStock).to.equal(0);
  });
});
