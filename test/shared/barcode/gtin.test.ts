import { expect } from 'chai';
import { gtinCheckDigit, isValidGtin, normalizeGtin } from '../../../shared/barcode/gtin.js';
import { BarcodeError } from '../../../shared/barcode/barcode-error.js';

describe('gtinCheckDigit', () => {
  it('completes the 12-digit body 629104150021 to GTIN-13 6291041500213 (GS1 "How to calculate a check digit manually")', () => {
    expect(gtinCheckDigit('629104150021')).to.equal(3);
  });

  it('refuses a body whose length belongs to no GTIN', () => {
    expect(() => gtinCheckDigit('12345')).to.throw(BarcodeError, /7, 11, 12 or 13 digits/);
  });
});

describe('isValidGtin', () => {
  it('accepts GTIN-14 09506000134352 (GS1 "How to calculate a check digit manually")', () => {
    expect(isValidGtin('09506000134352')).to.equal(true);
  });

  it('accepts the GTIN-13 8904000210037 from the same GS1 guide', () => {
    expect(isValidGtin('8904000210037')).to.equal(true);
  });

  it('refuses a GTIN with a wrong check digit', () => {
    expect(isValidGtin('8904000210038')).to.equal(false);
  });

  it('refuses a correctly check-digited number of a length no GTIN has', () => {
    // Leading zeros do not change a check digit, so 9 digits cut from GTIN-8 00000096385074 still check out.
    expect(isValidGtin('096385074')).to.equal(false);
  });
});

describe('normalizeGtin', () => {
  it('left-pads GTIN-8, GTIN-12 and GTIN-13 to 14 digits', () => {
    expect(normalizeGtin('96385074')).to.equal('00000096385074');
    expect(normalizeGtin('036000291452')).to.equal('00036000291452');
    expect(normalizeGtin('6291041500213')).to.equal('06291041500213');
  });

  it('keeps a GTIN-14 unchanged', () => {
    expect(normalizeGtin('09506000134352')).to.equal('09506000134352');
  });

  it('refuses a wrong check digit and says which digit was expected', () => {
    expect(() => normalizeGtin('6291041500214')).to.throw(BarcodeError, /wrong check digit.*end in 3/);
  });

  it('refuses a length no GTIN has', () => {
    expect(() => normalizeGtin('123456789')).to.throw(BarcodeError, /8, 12, 13 or 14 digits/);
  });
});
