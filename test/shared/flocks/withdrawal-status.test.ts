import { expect } from 'chai';
import { overrideApplies, withdrawalStatus } from '../../../shared/flocks/withdrawal-status.js';

// Common practice: no vaccination within 21 days before slaughter; the product label's withdrawal period governs.
describe('withdrawalStatus', () => {
  const depletionDate = '2026-09-30';

  it('flags a vaccination 20 days before depletion with the 21-day default, and blocks confirmation', () => {
    const status = withdrawalStatus({ plannedDate: '2026-09-10', depletionDate });
    expect(status).to.deep.equal({ flagged: true, withdrawalDays: 21, daysBeforeDepletion: 20, overridden: false, blocksConfirmation: true });
  });

  it('allows exactly 21 days before depletion', () => {
    expect(withdrawalStatus({ plannedDate: '2026-09-09', depletionDate }).flagged).to.equal(false);
  });

  it('uses the label’s withdrawal days over the default: 25 days before is flagged under a 28-day label', () => {
    expect(withdrawalStatus({ plannedDate: '2026-09-05', depletionDate, withdrawalDays: 28 }).flagged).to.equal(true);
    expect(withdrawalStatus({ plannedDate: '2026-09-05', depletionDate, withdrawalDays: 21 }).flagged).to.equal(false);
  });

  it('cannot flag without a planned depletion date', () => {
    expect(withdrawalStatus({ plannedDate: '2026-09-10', depletionDate: null })).to.include({ flagged: false, blocksConfirmation: false });
  });

  it('lets an override for the same date, depletion and label unblock it (hand-computed rule)', () => {
    const override = { vaccinationDate: '2026-09-10', depletionDate, withdrawalDays: 21 };
    expect(withdrawalStatus({ plannedDate: '2026-09-10', depletionDate, overrides: [override] })).to.include({ overridden: true, blocksConfirmation: false });
  });

  it('drops the override once the vaccination, the depletion or the label changes', () => {
    const override = { vaccinationDate: '2026-09-10', depletionDate, withdrawalDays: 21 };
    expect(withdrawalStatus({ plannedDate: '2026-09-11', depletionDate, overrides: [override] }).blocksConfirmation).to.equal(true);
    expect(overrideApplies(override, { ...override, depletionDate: '2026-09-25' })).to.equal(false);
    expect(overrideApplies(override, { ...override, withdrawalDays: 28 })).to.equal(false);
  });
});
