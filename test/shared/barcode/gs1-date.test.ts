import { expect } from 'chai';
import { parseGs1Date } from '../../../shared/barcode/gs1-date.js';
import { BarcodeError } from '../../../shared/barcode/barcode-error.js';

const NOW = new Date('2026-12-02T12:00:00Z');

describe('parseGs1Date', () => {
  describe('YYMMDD values from the GS1 Syntax Dictionary linter tests', () => {
    for (const valid of ['200229', '240229', '000229', '200600']) {
      it(`accepts ${valid} (GS1 Syntax Dictionary linter tests)`, () => {
        expect(parseGs1Date(valid, NOW).iso).to.match(/^\d{4}-\d{2}-\d{2}$/);
      });
    }
    for (const invalid of ['210229', '200230', '200431', '200010', '201310']) {
      it(`refuses ${invalid} (GS1 Syntax Dictionary linter tests)`, () => {
        expect(() => parseGs1Date(invalid, NOW)).to.throw(BarcodeError, new RegExp(invalid));
      });
    }
  });

  describe('day "00" (GS1 General Specifications)', () => {
    it('reads 130200 as 2013-02-28, the last day of a non-leap February', () => {
      expect(parseGs1Date('130200', NOW)).to.deep.equal({ iso: '2013-02-28', dayGiven: false });
    });

    it('reads 160200 as 2016-02-29, the last day of a leap February', () => {
      expect(parseGs1Date('160200', NOW)).to.deep.equal({ iso: '2016-02-29', dayGiven: false });
    });

    it('reads 200600 as 2020-06-30 (GS1 Syntax Dictionary linter tests)', () => {
      expect(parseGs1Date('200600', NOW)).to.deep.equal({ iso: '2020-06-30', dayGiven: false });
    });
  });

  it('reads an explicit day and reports that the day was given', () => {
    expect(parseGs1Date('271231', NOW)).to.deep.equal({ iso: '2027-12-31', dayGiven: true });
  });

  it('names the month when it is out of range', () => {
    expect(() => parseGs1Date('201310', NOW)).to.throw(BarcodeError, /month 13/);
  });

  it('names the number of days when the day does not exist in that month', () => {
    expect(() => parseGs1Date('200431', NOW)).to.throw(BarcodeError, /2020-04 has 30 days/);
  });

  it('refuses anything that is not six digits', () => {
    expect(() => parseGs1Date('2412', NOW)).to.throw(BarcodeError, /6 digits/);
  });
});
