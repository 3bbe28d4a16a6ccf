// The shared assessment of a shipment: discrepancies, warnings, arrival holds and the outcome to suggest.
import { expect } from 'chai';
import { assessShipment, type AssessedShipment, type ProductRangeInfo } from '../../../shared/receiving/assess-shipment.js';
import { allChecksFine } from '../../../shared/receiving/arrival-checks.js';

const spray: ProductRangeInfo = { productName: 'Spray A', range: { low: 35, high: 45, unit: 'F' } };
const injectable: ProductRangeInfo = { productName: 'Injectable B', range: { low: 2, high: 8, unit: 'C' } };
const products = new Map([[1, spray], [2, injectable]]);
const options = { storeWithinMinutes: 30 };

function shipment(overrides: Partial<AssessedShipment> = {}): AssessedShipment {
  return {
    arrivedAt: '2026-12-02T15:00:00.000Z',
    shippedAt: '2026-12-01T15:00:00.000Z',
    checks: { ...allChecksFine },
    reading: { value: 40, unit: 'F' },
    outcome: 'accepted',
    lines: [{ presentationId: 1, lotNumber: 'A1', expiry: '2028-01-31', accepted: true, storedAt: null, vialsExpected: 20, vialsIntact: 20, vialsBroken: 0, vialsMissing: 0 }],
    ...overrides,
  };
}

describe('assessShipment', () => {
  it('finds nothing in a clean shipment and suggests "accepted"', () => {
    const result = assessShipment(shipment(), products, options);
    expect(result).to.include({ suggestedOutcome: 'accepted', needsReport: false, outcomeProblem: null });
    expect(result.discrepancies).to.deep.equal([]);
    expect(result.arrivalHolds).to.deep.equal([]);
    // 24 h in transit (hand-computed).
    expect(result.transitHours).to.equal(24);
  });

  it('a reading on the limit is in range: 45 °F for a 35–45 °F label (common practice range)', () => {
    expect(assessShipment(shipment({ reading: { value: 45, unit: 'F' } }), products, options).arrivalHolds).to.deep.equal([]);
  });

  it('45.1 °F is above 35–45 °F: a warm arrival holds the lot and needs a report', () => {
    const result = assessShipment(shipment({ reading: { value: 45.1, unit: 'F' }, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(result.discrepancies.map((d) => d.kind)).to.deep.equal(['reading_out_of_range']);
    expect(result.arrivalHolds).to.deep.equal([{ line: 0, reasons: ["The reading 45.1 °F is above Spray A's label range 35–45 °F."] }]);
    expect(result.needsReport).to.equal(true);
  });

  it('judges each line against its own product: 46 °F (7.78 °C, NIST SP 811) is warm for 35–45 °F, fine for 2–8 °C', () => {
    const lines = [
      { ...shipment().lines[0]!, presentationId: 1, lotNumber: 'A1' },
      { ...shipment().lines[0]!, presentationId: 2, lotNumber: 'B1' },
    ];
    const result = assessShipment(shipment({ lines, reading: { value: 46, unit: 'F' }, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(result.arrivalHolds.map((h) => h.line)).to.deep.equal([0]);
  });

  it('a freezing reading is below the range: 1 °C for 2–8 °C', () => {
    const lines = [{ ...shipment().lines[0]!, presentationId: 2 }];
    const result = assessShipment(shipment({ lines, reading: { value: 1, unit: 'C' }, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(result.arrivalHolds[0]!.reasons[0]).to.match(/1 °C is below Injectable B's label range 2–8 °C/);
  });

  it('a triggered indicator and warm contents hold lots; a damaged box and missing coolant are discrepancies but no hold (common practice checks)', () => {
    const held = assessShipment(shipment({ checks: { ...allChecksFine, indicator: 'triggered', contentsCold: false }, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(held.arrivalHolds[0]!.reasons).to.deep.equal(['The temperature indicator was triggered.', 'The contents were not cold on arrival.']);
    const damaged = assessShipment(shipment({ checks: { ...allChecksFine, containerIntact: false, coolantPresent: false }, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(damaged.discrepancies.map((d) => d.kind)).to.deep.equal(['container_damaged', 'coolant_missing']);
    expect(damaged.arrivalHolds).to.deep.equal([]);
  });

  it('counts broken, missing, and counts that do not add up (hand-computed)', () => {
    const lines = [{ ...shipment().lines[0]!, vialsExpected: 20, vialsIntact: 16, vialsBroken: 2, vialsMissing: 1 }];
    const result = assessShipment(shipment({ lines, outcome: 'accepted_with_discrepancies' }), products, options);
    expect(result.discrepancies.map((d) => d.kind)).to.deep.equal(['broken', 'missing', 'count_mismatch']);
    expect(result.discrepancies[2]!.message).to.equal('Lot A1: 19 vial(s) counted against 20 expected.');
  });

  it('"accepted" with a discrepancy is an outcome problem; so is accepting with no line taking stock', () => {
    const lines = [{ ...shipment().lines[0]!, vialsBroken: 1, vialsIntact: 19 }];
    expect(assessShipment(shipment({ lines }), products, options).outcomeProblem).to.match(/accepted with discrepancies/);
    const none = [{ ...shipment().lines[0]!, accepted: false }];
    expect(assessShipment(shipment({ lines: none, outcome: 'accepted_with_discrepancies' }), products, options).outcomeProblem).to.match(/refuse the shipment instead/);
  });

  it('a refused shipment holds nothing, whatever its reading, and always needs a report', () => {
    const result = assessShipment(shipment({ outcome: 'refused', reading: { value: 60, unit: 'F' } }), products, options);
    expect(result.arrivalHolds).to.deep.equal([]);
    expect(result.needsReport).to.equal(true);
    expect(result.suggestedOutcome).to.equal('refused');
    expect(result.outcomeProblem).to.equal(null);
  });

  it('warns when transit took over 48 h (PHAC National Vaccine Storage and Handling Guidelines 2007 §9.2), not at exactly 48 h', () => {
    const at48 = assessShipment(shipment({ shippedAt: '2026-11-30T15:00:00.000Z' }), products, options);
    expect(at48.warnings.map((w) => w.kind)).to.not.include('transit_long');
    const over = assessShipment(shipment({ shippedAt: '2026-11-30T14:59:00.000Z' }), products, options);
    expect(over.warnings.map((w) => w.kind)).to.include('transit_long');
  });

  it('warns when a lot went into the fridge later than the site allows, and not when on time', () => {
    const late = [{ ...shipment().lines[0]!, storedAt: '2026-12-02T15:31:00.000Z' }];
    expect(assessShipment(shipment({ lines: late }), products, options).warnings.map((w) => w.kind)).to.deep.equal(['stored_late']);
    const onTime = [{ ...shipment().lines[0]!, storedAt: '2026-12-02T15:30:00.000Z' }];
    expect(assessShipment(shipment({ lines: onTime }), products, options).warnings).to.deep.equal([]);
  });

  it('warns of an expired lot and of a missing reading', () => {
    const expired = [{ ...shipment().lines[0]!, expiry: '2026-12-01' }];
    const result = assessShipment(shipment({ lines: expired, reading: null }), products, options);
    expect(result.warnings.map((w) => w.kind)).to.deep.equal(['expired', 'no_reading']);
  });
});
