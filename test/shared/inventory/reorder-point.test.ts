import { expect } from 'chai';
import { reorderPoint, reorderPointForVariableDemand } from '../../../shared/inventory/reorder-point.js';
import { zForServiceLevel } from '../../../shared/inventory/service-level-z.js';

// Stevenson, Operations Management, 14th ed., ch. 12, Example 8: lead-time demand 50, σ 5, 3 % stock-out risk.
describe('reorderPoint', () => {
  it('reproduces Stevenson Example 8 with the table z of 1.88: safety stock 9.40, ROP 59.40', () => {
    const z = Math.round(zForServiceLevel(1 - 0.03) * 100) / 100;
    expect(z).to.equal(1.88);
    const result = reorderPoint({ expectedLeadTimeDemand: 50, leadTimeDemandSd: 5, z });
    expect(result.safetyStock).to.be.closeTo(9.4, 1e-9);
    expect(result.reorderPoint).to.be.closeTo(59.4, 1e-9);
  });

  it('stays close to Stevenson Example 8 with the unrounded z (1.8808 → ROP 59.404)', () => {
    const result = reorderPoint({ expectedLeadTimeDemand: 50, leadTimeDemandSd: 5, z: zForServiceLevel(0.97) });
    expect(result.reorderPoint).to.be.closeTo(59.404, 0.001);
  });

  it('scales per-period variation by √LT: 50 a day, σ 5, 4 days, z 1.65 → 200 + 16.5 = 216.5 (hand-computed)', () => {
    const result = reorderPointForVariableDemand({ meanDemandPerPeriod: 50, demandSdPerPeriod: 5, leadTimePeriods: 4, z: 1.65 });
    expect(result.safetyStock).to.be.closeTo(16.5, 1e-9);
    expect(result.reorderPoint).to.be.closeTo(216.5, 1e-9);
  });

  it('refuses a negative standard deviation', () => {
    expect(() => reorderPoint({ expectedLeadTimeDemand: 50, leadTimeDemandSd: -5, z: 1.88 })).to.throw(RangeError);
  });
});
