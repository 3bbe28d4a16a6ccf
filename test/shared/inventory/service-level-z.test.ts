import { expect } from 'chai';
import { zForServiceLevel } from '../../../shared/inventory/service-level-z.js';

const toFourDecimals = (value: number): number => Math.round(value * 10_000) / 10_000;

// Expected values from the published standard normal table.
describe('zForServiceLevel', () => {
  it('matches the standard normal table at 90, 95, 97 and 99 % to 4 decimals', () => {
    expect(toFourDecimals(zForServiceLevel(0.9))).to.equal(1.2816);
    expect(toFourDecimals(zForServiceLevel(0.95))).to.equal(1.6449);
    expect(toFourDecimals(zForServiceLevel(0.97))).to.equal(1.8808);
    expect(toFourDecimals(zForServiceLevel(0.99))).to.equal(2.3263);
  });

  it('is zero at 50 % and negative below it', () => {
    expect(zForServiceLevel(0.5)).to.be.closeTo(0, 1e-12);
    expect(zForServiceLevel(0.1)).to.be.below(0);
  });

  it('refuses service levels of 0, 1 or outside them', () => {
    for (const level of [0, 1, -0.1, 1.5, Number.NaN]) expect(() => zForServiceLevel(level), String(level)).to.throw(RangeError);
  });
});
