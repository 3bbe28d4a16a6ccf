import { expect } from 'chai';
import { roundUpToPacks, vialsForDoses } from '../../../shared/inventory/pack-rounding.js';

describe('pack rounding', () => {
  it('rounds 23 vials up to 3 packs of 10 = 30 vials (common practice: vials come 10 to a pack)', () => {
    expect(roundUpToPacks(23)).to.deep.equal({ packs: 3, vials: 30 });
  });

  it('leaves a whole number of packs alone and orders nothing for nothing', () => {
    expect(roundUpToPacks(30)).to.deep.equal({ packs: 3, vials: 30 });
    expect(roundUpToPacks(0)).to.deep.equal({ packs: 0, vials: 0 });
    expect(roundUpToPacks(1)).to.deep.equal({ packs: 1, vials: 10 });
  });

  it('uses another pack size when the supplier packs differently', () => {
    expect(roundUpToPacks(23, 25)).to.deep.equal({ packs: 1, vials: 25 });
  });

  it('rounds doses up to whole vials: 20,000 doses is one 20,000-dose vial, 20,001 is two (common practice)', () => {
    expect(vialsForDoses(20_000, 20_000)).to.equal(1);
    expect(vialsForDoses(20_001, 20_000)).to.equal(2);
  });

  it('refuses fractional vials and empty packs', () => {
    expect(() => roundUpToPacks(2.5)).to.throw(RangeError);
    expect(() => roundUpToPacks(5, 0)).to.throw(RangeError);
  });
});
