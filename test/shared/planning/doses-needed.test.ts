import { expect } from 'chai';
import { dosesNeeded, overagePercentToBasisPoints } from '../../../shared/planning/doses-needed.js';

describe('dosesNeeded', () => {
  it('needs one dose per bird with no overage (common practice)', () => {
    expect(dosesNeeded(20_000)).to.equal(20_000);
  });

  it('makes 20,000 birds at 5 % exactly 21,000 doses', () => {
    expect(dosesNeeded(20_000, overagePercentToBasisPoints(5))).to.equal(21_000);
  });

  it('makes 30,000 birds at 7 % exactly 32,100, where Math.ceil(30000 * 1.07) would give 32,101', () => {
    expect(Math.ceil(30_000 * 1.07)).to.equal(32_101);
    expect(dosesNeeded(30_000, overagePercentToBasisPoints(7))).to.equal(32_100);
    expect(dosesNeeded(100, overagePercentToBasisPoints(10))).to.equal(110);
  });

  it('rounds a fractional dose up: 101 birds at 5 % need 107', () => {
    expect(dosesNeeded(101, 500)).to.equal(107);
  });

  it('handles two-decimal percentages whose binary form is inexact', () => {
    expect(overagePercentToBasisPoints(1.15)).to.equal(115);
    expect(dosesNeeded(20_000, overagePercentToBasisPoints(1.15))).to.equal(20_230);
  });

  it('needs nothing for an empty house', () => {
    expect(dosesNeeded(0, 500)).to.equal(0);
  });

  it('refuses negative or fractional birds and over-precise percentages', () => {
    expect(() => dosesNeeded(-1)).to.throw(RangeError);
    expect(() => dosesNeeded(10.5)).to.throw(RangeError);
    expect(() => overagePercentToBasisPoints(1.005)).to.throw(RangeError, /two decimals/);
    expect(() => overagePercentToBasisPoints(-1)).to.throw(RangeError);
  });
});
