import { expect } from 'chai';
import { compareIds } from '../../../shared/planning/entity-id.js';

describe('compareIds', () => {
  it('orders numbers by value, before strings, and strings by code unit', () => {
    expect(['b', 10, 'B', 2, 'a10', 'a9'].sort(compareIds)).to.deep.equal([2, 10, 'B', 'a10', 'a9', 'b']);
  });

  it('treats the number 7 and the string "7" as different ids', () => {
    expect(compareIds(7, '7')).to.be.below(0);
    expect(compareIds('7', 7)).to.be.above(0);
  });
});
