// GTIN fields in catalogue forms: check digit per GS1 "How to calculate a check digit manually", stored as 14 digits.
import { expect } from 'chai';
import { gtinField, optionalGtinField } from '../../../shared/catalogue/gtin-field.js';
import { findPresentationByGtin } from '../../../shared/catalogue/find-presentation-by-gtin.js';
import type { ProductView } from '../../../shared/catalogue/product-schemas.js';

describe('gtinField', () => {
  it('accepts 6291041500213, 7300011000017 and 8904000210037 and pads them to 14 digits (GS1 check digit examples)', () => {
    expect(['6291041500213', '7300011000017', '8904000210037'].map((g) => gtinField.parse(g))).to.deep.equal(['06291041500213', '07300011000017', '08904000210037']);
  });

  it('ignores spaces a person types between digit groups', () => {
    expect(gtinField.parse('0 9506000 13435 2')).to.equal('09506000134352');
  });

  it('refuses a wrong check digit, saying which digit it should be', () => {
    const result = gtinField.safeParse('6291041500214');
    expect(result.success).to.equal(false);
    expect(result.error!.issues[0]!.message).to.match(/should end in 3/);
  });

  it('optional: empty means none', () => {
    expect(optionalGtinField.parse('')).to.equal(null);
    expect(optionalGtinField.parse(null)).to.equal(null);
    expect(optionalGtinField.parse(undefined)).to.equal(null);
  });
});

describe('findPresentationByGtin', () => {
  const product = { id: 1, name: 'P', presentations: [{ id: 7, packGtin: '09506000134352', vialGtin: '06291041500213' }] } as unknown as ProductView;

  it('finds a pack GTIN and a vial GTIN, and nothing for an unknown one', () => {
    expect(findPresentationByGtin([product], '09506000134352')).to.include({ level: 'pack' });
    expect(findPresentationByGtin([product], '06291041500213')).to.include({ level: 'vial' });
    expect(findPresentationByGtin([product], '07300011000017')).to.equal(null);
  });
});
