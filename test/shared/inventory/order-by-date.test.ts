import { expect } from 'chai';
import { orderByDate } from '../../../shared/inventory/order-by-date.js';

describe('orderByDate', () => {
  it('is the first shortfall date less lead time and margin: 2026-03-10 − 14 − 3 = 2026-02-21', () => {
    expect(orderByDate('2026-03-10', 14, 3)).to.equal('2026-02-21');
  });

  it('crosses a year boundary: 2026-01-05 − 7 − 2 = 2025-12-27', () => {
    expect(orderByDate('2026-01-05', 7, 2)).to.equal('2025-12-27');
  });

  it('lands on February 29 in a leap year', () => {
    expect(orderByDate('2028-03-07', 5, 2)).to.equal('2028-02-29');
  });

  it('defaults the safety margin to none', () => {
    expect(orderByDate('2026-03-10', 10)).to.equal('2026-02-28');
  });

  it('refuses negative or fractional day counts', () => {
    expect(() => orderByDate('2026-03-10', -1)).to.throw(RangeError, /lead time/);
    expect(() => orderByDate('2026-03-10', 5, 0.5)).to.throw(RangeError, /safety margin/);
  });
});
