// From ledger movements to stays and time out of a fridge (hand-computed cases of our own rule).
import { expect } from 'chai';
import { movementHistory, staysFromBalanceChanges, type LedgerMovement } from '../../../shared/exposure/index.js';

const m = (kind: LedgerMovement['kind'], vials: number, from: number | null, to: number | null, at: number, leftAt: number | null = null, source = 1): LedgerMovement =>
  ({ kind, vials, fromFridgeId: from, toFridgeId: to, at, leftAt, sourceKind: 'test', sourceId: source });

describe('movement history', () => {
  it('a transfer leaves the first fridge when the vials left and reaches the second when they arrived, with the time out between', () => {
    const history = movementHistory([m('receive', 10, null, 1, 100), m('transfer', 10, 1, 2, 300, 250)]);
    expect(history.timeOut).to.deep.equal([{ reason: 'transfer', from: 250, to: 300 }]);
    expect(staysFromBalanceChanges(history.changes)).to.deep.equal([
      { fridgeId: 1, from: 100, to: 250 },
      { fridgeId: 2, from: 300, to: null },
    ]);
  });

  it('an issue is time out until the return from the same vaccination; without a return it stays open (used)', () => {
    const returned = movementHistory([m('receive', 5, null, 1, 0), m('issue', 3, 1, null, 200, 180, 7), m('return', 1, null, 1, 400, null, 7)]);
    expect(returned.timeOut).to.deep.equal([{ reason: 'issue', from: 180, to: 400 }]);
    const used = movementHistory([m('receive', 5, null, 1, 0), m('issue', 3, 1, null, 200, 180, 8)]);
    expect(used.timeOut).to.deep.equal([{ reason: 'issue', from: 180, to: null }]);
  });

  it('discarding the last vials closes the stay', () => {
    const history = movementHistory([m('receive', 2, null, 1, 0), m('discard', 2, 1, null, 500)]);
    expect(staysFromBalanceChanges(history.changes)).to.deep.equal([{ fridgeId: 1, from: 0, to: 500 }]);
  });
});
