import { expect } from 'chai';
import { monthEndExpiry, normalizeExpiry } from '../../../shared/planning/month-end-expiry.js';

// Month/year expiry means the last day of that month: PHAC National Vaccine Storage and Handling Guidelines 2007 §8.2.
describe('monthEndExpiry', () => {
  it('turns 2027-03 into 2027-03-31 (PHAC 2007 §8.2)', () => {
    expect(monthEndExpiry('2027-03')).to.equal('2027-03-31');
  });

  it('ends February on the 29th in a leap year and the 28th otherwise (PHAC 2007 §8.2)', () => {
    expect(monthEndExpiry('2028-02')).to.equal('2028-02-29');
    expect(monthEndExpiry('2000-02')).to.equal('2000-02-29');
    expect(monthEndExpiry('2027-02')).to.equal('2027-02-28');
    expect(monthEndExpiry('2100-02')).to.equal('2100-02-28');
  });

  it('ends 30-day months on the 30th', () => {
    expect(['2027-04', '2027-06', '2027-09', '2027-11'].map(monthEndExpiry)).to.deep.equal(['2027-04-30', '2027-06-30', '2027-09-30', '2027-11-30']);
  });

  it('rejects text that is not YYYY-MM with a month 01-12', () => {
    for (const text of ['2027-13', '2027-00', '2027-3', '27-03', '2027-03-15']) expect(() => monthEndExpiry(text), text).to.throw(RangeError);
  });
});

describe('normalizeExpiry', () => {
  it('keeps a full date and expands a month/year to month end', () => {
    expect(normalizeExpiry('2027-03-15')).to.equal('2027-03-15');
    expect(normalizeExpiry('2027-03')).to.equal('2027-03-31');
  });

  it('rejects an impossible full date', () => {
    expect(() => normalizeExpiry('2027-02-29')).to.throw(RangeError, /YYYY-MM-DD or YYYY-MM/);
  });
});
