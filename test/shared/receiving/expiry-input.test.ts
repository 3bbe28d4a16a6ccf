// Expiry as typed: a full date, or month/year as the month's last day (PHAC National Vaccine Storage and Handling Guidelines 2007 §8.2).
import { expect } from 'chai';
import { readExpiry } from '../../../shared/receiving/expiry-input.js';

describe('readExpiry', () => {
  it('keeps a full date with its day given', () => {
    expect(readExpiry('2027-03-15')).to.deep.equal({ expiry: '2027-03-15', dayGiven: true });
  });

  it('reads month/year as the last day of that month, leap years included (PHAC 2007 §8.2)', () => {
    expect(readExpiry('2028-02')).to.deep.equal({ expiry: '2028-02-29', dayGiven: false });
    expect(readExpiry('2027-02')).to.deep.equal({ expiry: '2027-02-28', dayGiven: false });
    expect(readExpiry(' 2027-11 ')).to.deep.equal({ expiry: '2027-11-30', dayGiven: false });
  });

  it('refuses what is no date', () => {
    for (const text of ['2027-02-29', '2027-13', '03/2027', '', 'soon']) expect(readExpiry(text), text).to.equal(null);
  });
});
