import { expect } from 'chai';
import { safetyStockDoses } from '../../../shared/inventory/safety-stock.js';

describe('safetyStockDoses', () => {
  it('uses doses given directly', () => {
    expect(safetyStockDoses({ kind: 'doses', doses: 4000 })).to.equal(4000);
  });

  it('turns days of cover into days × average daily doses: 3 × 1,500 = 4,500', () => {
    expect(safetyStockDoses({ kind: 'daysOfCover', days: 3, averageDailyDoses: 1500 })).to.equal(4500);
  });

  it('rounds a fractional dose up but not binary noise: 2 × 1,000.5 = 2,001 and 100 × 1.1 = 110', () => {
    expect(safetyStockDoses({ kind: 'daysOfCover', days: 2, averageDailyDoses: 1000.5 })).to.equal(2001);
    expect(safetyStockDoses({ kind: 'daysOfCover', days: 100, averageDailyDoses: 1.1 })).to.equal(110);
  });

  it('refuses negative cover', () => {
    expect(() => safetyStockDoses({ kind: 'daysOfCover', days: -1, averageDailyDoses: 100 })).to.throw(RangeError);
  });
});
