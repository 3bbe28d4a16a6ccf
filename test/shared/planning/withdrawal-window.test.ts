import { expect } from 'chai';
import { isInWithdrawalWindow } from '../../../shared/planning/withdrawal-window.js';

// Common practice: no vaccination within 21 days before slaughter; the product label's withdrawal period governs.
describe('isInWithdrawalWindow', () => {
  const depletion = '2026-06-30';

  it('flags a vaccination 20 days before depletion (common practice, 21-day default)', () => {
    expect(isInWithdrawalWindow('2026-06-10', depletion)).to.equal(true);
  });

  it('allows a vaccination exactly 21 days before depletion: the boundary day is outside the window', () => {
    expect(isInWithdrawalWindow('2026-06-09', depletion)).to.equal(false);
  });

  it('allows a vaccination 22 days before depletion', () => {
    expect(isInWithdrawalWindow('2026-06-08', depletion)).to.equal(false);
  });

  it('flags a vaccination on or after the depletion date', () => {
    expect(isInWithdrawalWindow(depletion, depletion)).to.equal(true);
    expect(isInWithdrawalWindow('2026-07-02', depletion)).to.equal(true);
  });

  it('uses the label’s withdrawal days when given: 21 days before is flagged under a 28-day label', () => {
    expect(isInWithdrawalWindow('2026-06-09', depletion, 28)).to.equal(true);
    expect(isInWithdrawalWindow('2026-06-02', depletion, 28)).to.equal(false);
  });

  it('counts across a month boundary by calendar days', () => {
    expect(isInWithdrawalWindow('2026-02-08', '2026-03-01')).to.equal(false);
    expect(isInWithdrawalWindow('2026-02-09', '2026-03-01')).to.equal(true);
  });

  it('rejects negative withdrawal days', () => {
    expect(() => isInWithdrawalWindow('2026-06-09', depletion, -1)).to.throw(RangeError);
  });
});
