import { expect } from 'chai';
import { gs1CheckDigit, hasValidGs1CheckDigit } from '../../../shared/barcode/gs1-check-digit.js';
import { BarcodeError } from '../../../shared/barcode/barcode-error.js';

// Source: GS1 "How to calculate a check digit manually" (weights 3,1,3,1,... from the right).
describe('gs1CheckDigit', () => {
  const cases: Array<[string, string]> = [
    ['629104150021', '6291041500213'],
    ['730001100001', '7300011000017'],
    ['890400021003', '8904000210037'],
  ];
  for (const [body, full] of cases) {
    it(`completes ${body} to ${full} (GS1 "How to calculate a check digit manually")`, () => {
      expect(body + String(gs1CheckDigit(body))).to.equal(full);
    });
  }

  it('gives 0 rather than 10 when the weighted sum is already a multiple of ten', () => {
    // 3*5 + 1*5 = 20
    expect(gs1CheckDigit('55')).to.equal(0);
  });

  it('refuses a body containing a non-digit', () => {
    expect(() => gs1CheckDigit('12A4')).to.throw(BarcodeError, /only be computed over digits/);
  });
});

describe('hasValidGs1CheckDigit', () => {
  it('accepts GTIN-14 09506000134352 (GS1 "How to calculate a check digit manually")', () => {
    expect(hasValidGs1CheckDigit('09506000134352')).to.equal(true);
  });

  it('refuses the same key with its last digit changed', () => {
    expect(hasValidGs1CheckDigit('09506000134353')).to.equal(false);
  });

  it('refuses text that is not all digits', () => {
    expect(hasValidGs1CheckDigit('0950600013435X')).to.equal(false);
  });
});
