import { expect } from 'chai';
import { belowSafetyFrom, lowestLevel, stockLevels } from '../../../shared/demand/stock-levels.js';

// Hand-computed levels: one 1,000-dose lot of 30 vials expiring 2026-06-30, an order of 12 vials arriving 2026-06-15.
describe('stockLevels', () => {
  const lots = [
    { id: 1, dosesPerVial: 1000, vials: 30, expiry: '2026-06-30', status: 'usable' as const, availableFrom: null },
    { id: 'order-1', dosesPerVial: 1000, vials: 12, expiry: '9999-12-31', status: 'usable' as const, availableFrom: '2026-06-15' },
    { id: 2, dosesPerVial: 1000, vials: 50, expiry: '2026-12-31', status: 'hold' as const, availableFrom: null },
  ];
  const points = stockLevels({ today: '2026-06-01', horizonEnd: '2026-07-31', lots, takings: [{ date: '2026-06-10', lot: 1, vials: 20 }] });

  it('measures today, after each taking, before each arrival, after each expiry and at the horizon’s end; held lots never count', () => {
    expect(points).to.deep.equal([
      { date: '2026-06-01', doses: 30_000 },
      { date: '2026-06-10', doses: 10_000 },
      { date: '2026-06-14', doses: 10_000 },
      { date: '2026-07-01', doses: 12_000 },
      { date: '2026-07-31', doses: 12_000 },
    ]);
  });

  it('finds the lowest point and the first day below a safety stock', () => {
    expect(lowestLevel(points)).to.deep.equal({ date: '2026-06-10', doses: 10_000 });
    expect(belowSafetyFrom(points, 15_000)).to.equal('2026-06-10');
    expect(belowSafetyFrom(points, 10_000)).to.equal(null);
  });
});
