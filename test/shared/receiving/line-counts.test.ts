// A line's differences from what was expected (hand-computed cases).
import { expect } from 'chai';
import { lineDifference } from '../../../shared/receiving/line-counts.js';

describe('lineDifference', () => {
  it('20 expected, 17 intact, 2 broken, 1 missing: adds up, 3 short', () => {
    expect(lineDifference({ vialsExpected: 20, vialsIntact: 17, vialsBroken: 2, vialsMissing: 1 })).to.deep.equal({ broken: 2, missing: 1, unaccounted: 0, short: 3 });
  });

  it('an extra vial shows as +1 unaccounted and none short', () => {
    expect(lineDifference({ vialsExpected: 10, vialsIntact: 11, vialsBroken: 0, vialsMissing: 0 })).to.deep.equal({ broken: 0, missing: 0, unaccounted: 1, short: 0 });
  });
});
