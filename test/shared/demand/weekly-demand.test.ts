import { expect } from 'chai';
import { MIN_HISTORY_WEEKS, proposeFromWeeklyUse } from '../../../shared/demand/safety-stock-proposal.js';
import { weeklyDemand } from '../../../shared/demand/weekly-demand.js';
import { zForServiceLevel } from '../../../shared/inventory/service-level-z.js';

describe('weeklyDemand', () => {
  it('sums use into whole weeks ending yesterday, oldest first, from the week of the first use (hand-computed)', () => {
    // Today 2026-03-29: week 0 is 03-22..03-28, week 1 is 03-15..03-21, week 2 is 03-08..03-14.
    const history = weeklyDemand(
      [
        { date: '2026-03-10', doses: 20_000 },
        { date: '2026-03-22', doses: 15_000 },
        { date: '2026-03-28', doses: 5000 },
        { date: '2026-03-29', doses: 99_999 },
      ],
      '2026-03-29',
    );
    expect(history).to.deep.equal([20_000, 0, 20_000]);
  });

  it('leaves out use older than the window and has no history without use', () => {
    expect(weeklyDemand([{ date: '2024-01-01', doses: 1000 }], '2026-03-29')).to.deep.equal([]);
  });

  it('counts returns against issues and never goes below zero in a week', () => {
    expect(weeklyDemand([{ date: '2026-03-27', doses: -2000 }, { date: '2026-03-26', doses: 1000 }], '2026-03-29')).to.deep.equal([0]);
  });
});

describe('proposeFromWeeklyUse', () => {
  it('reproduces Stevenson Example 8 (lead-time demand 50, σ 5, 3 % risk → safety stock 9.40, ROP 59.40) from a weekly history with a one-week lead time', () => {
    // Weekly use 55, 45, 55, 45, 50: mean 50, sample standard deviation 5; a 7-day lead time is one period.
    const proposal = proposeFromWeeklyUse([55, 45, 55, 45, 50], 0.97, 7)!;
    expect(proposal.meanWeeklyDoses).to.equal(50);
    expect(proposal.sdWeeklyDoses).to.be.closeTo(5, 1e-12);
    expect(Math.round(proposal.z * 100) / 100).to.equal(1.88);
    expect(proposal.safetyStock).to.be.closeTo(9.4, 0.01);
    expect(proposal.reorderPoint).to.be.closeTo(59.4, 0.01);
    expect(proposal).to.include({ safetyStockDoses: 10, reorderPointDoses: 60 });
  });

  it('scales by √LT: a 28-day lead time is 4 weeks, so the safety stock doubles (hand-computed)', () => {
    const proposal = proposeFromWeeklyUse([55, 45, 55, 45, 50], 0.95, 28)!;
    expect(proposal.safetyStock).to.be.closeTo(zForServiceLevel(0.95) * 5 * 2, 1e-9);
    expect(proposal.reorderPoint).to.be.closeTo(200 + zForServiceLevel(0.95) * 10, 1e-9);
  });

  it(`needs at least ${MIN_HISTORY_WEEKS} weeks of history`, () => {
    expect(proposeFromWeeklyUse([50, 60, 40], 0.95, 7)).to.equal(null);
  });
});
