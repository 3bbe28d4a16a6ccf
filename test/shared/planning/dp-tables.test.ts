import { expect } from 'chai';
import { addLotToFewestVials, emptyFewestVials, UNREACHABLE } from '../../../shared/planning/fewest-vials.js';
import { addLotToReachable, emptyReachable, isReachable, type ReachableTotals } from '../../../shared/planning/reachable-totals.js';

const reachableUpTo = (bits: ReachableTotals, maxTotal: number): number[] =>
  Array.from({ length: maxTotal + 1 }, (_, total) => total).filter((total) => isReachable(bits, total));

describe('addLotToReachable', () => {
  it('reaches 0, 2 and 4 with two vials of size 2, and no more', () => {
    expect(reachableUpTo(addLotToReachable(emptyReachable(10), 2, 2), 10)).to.deep.equal([0, 2, 4]);
  });

  it('combines with totals already reachable', () => {
    const withThree = addLotToReachable(emptyReachable(10), 3, 1);
    expect(reachableUpTo(addLotToReachable(withThree, 2, 2), 10)).to.deep.equal([0, 2, 3, 4, 5, 7]);
  });

  it('carries totals across 32-bit word boundaries exactly: 0..10 vials of 7 and one vial of 33', () => {
    const bits = addLotToReachable(addLotToReachable(emptyReachable(200), 7, 10), 33, 1);
    const expected = [...new Set([0, 33].flatMap((base) => Array.from({ length: 11 }, (_, vials) => base + vials * 7)))].sort((a, b) => a - b);
    expect(reachableUpTo(bits, 200)).to.deep.equal(expected);
  });

  it('leaves the table it was given unchanged', () => {
    const empty = emptyReachable(10);
    addLotToReachable(empty, 1, 5);
    expect(reachableUpTo(empty, 10)).to.deep.equal([0]);
  });
});

describe('addLotToFewestVials', () => {
  it('counts vials of one lot and stops at its vial count', () => {
    expect([...addLotToFewestVials(emptyFewestVials(7), 2, 2)]).to.deep.equal([0, UNREACHABLE, 1, UNREACHABLE, 2, UNREACHABLE, UNREACHABLE]);
  });

  it('prefers the bigger vial when two lots can make the same total', () => {
    const ones = addLotToFewestVials(emptyFewestVials(7), 1, 6);
    expect([...addLotToFewestVials(ones, 3, 2)]).to.deep.equal([0, 1, 2, 1, 2, 3, 2]);
  });
});
