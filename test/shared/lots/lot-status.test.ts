// Lot status on hand-computed cases of our own rule; expiry is the last usable day (PHAC 2007 §8.2).
import { expect } from 'chai';
import { lotStatus } from '../../../shared/lots/lot-status.js';

const base = { expiry: '2027-03-31', today: '2027-01-10', holds: [], vialsOnHand: 10, discarded: false };

describe('lot status', () => {
  it('is usable with no hold, before expiry, with vials', () => expect(lotStatus(base)).to.equal('usable'));

  it('stays on hold until both of two holds are decided in its favour', () => {
    expect(lotStatus({ ...base, holds: [{ decision: 'release' }, { decision: null }] })).to.equal('on_hold');
    expect(lotStatus({ ...base, holds: [{ decision: 'release' }, { decision: 'release_with_condition' }] })).to.equal('usable');
  });

  it('a discard decision keeps the lot from use', () => {
    expect(lotStatus({ ...base, holds: [{ decision: 'discard' }] })).to.equal('on_hold');
    expect(lotStatus({ ...base, holds: [{ decision: 'discard' }], vialsOnHand: 0, discarded: true })).to.equal('discarded');
  });

  it('is usable on its expiry day and expired the day after (PHAC 2007 §8.2: usable through the last day)', () => {
    expect(lotStatus({ ...base, today: '2027-03-31' })).to.equal('usable');
    expect(lotStatus({ ...base, today: '2027-04-01' })).to.equal('expired');
  });

  it('with no vials left is used up, or discarded when its vials were discarded', () => {
    expect(lotStatus({ ...base, vialsOnHand: 0 })).to.equal('used_up');
    expect(lotStatus({ ...base, vialsOnHand: 0, discarded: true })).to.equal('discarded');
  });
});
