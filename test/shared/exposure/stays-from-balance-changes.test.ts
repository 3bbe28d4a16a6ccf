// Stays per fridge from a lot's ledger (hand-computed cases of our own rule).
import { expect } from 'chai';
import { staysFromBalanceChanges } from '../../../shared/exposure/index.js';

describe('stays from balance changes', () => {
  it('a receipt opens a stay that is still open', () => {
    expect(staysFromBalanceChanges([{ fridgeId: 1, at: 100, vials: 20 }])).to.deep.equal([{ fridgeId: 1, from: 100, to: null }]);
  });

  it('a partial transfer leaves the first stay open and opens a second; taking the rest closes the first', () => {
    const stays = staysFromBalanceChanges([
      { fridgeId: 1, at: 100, vials: 20 },
      { fridgeId: 1, at: 200, vials: -5 },
      { fridgeId: 2, at: 230, vials: 5 },
      { fridgeId: 1, at: 300, vials: -15 },
    ]);
    expect(stays).to.deep.equal([
      { fridgeId: 1, from: 100, to: 300 },
      { fridgeId: 2, from: 230, to: null },
    ]);
  });

  it('a fridge emptied and refilled later has two stays', () => {
    const stays = staysFromBalanceChanges([
      { fridgeId: 1, at: 100, vials: 10 },
      { fridgeId: 1, at: 200, vials: -10 },
      { fridgeId: 1, at: 400, vials: 3 },
    ]);
    expect(stays).to.deep.equal([{ fridgeId: 1, from: 100, to: 200 }, { fridgeId: 1, from: 400, to: null }]);
  });

  it('an arrival and a departure at the same instant do not break the stay', () => {
    const stays = staysFromBalanceChanges([
      { fridgeId: 1, at: 100, vials: 10 },
      { fridgeId: 1, at: 200, vials: -10 },
      { fridgeId: 1, at: 200, vials: 4 },
    ]);
    expect(stays).to.deep.equal([{ fridgeId: 1, from: 100, to: null }]);
  });
});
