// The receiving form's schema, shared by the client and the API: what it accepts, what it names when refusing.
import { expect } from 'chai';
import { shipmentInputSchema } from '../../../shared/receiving/shipment-input-schema.js';

const line = { presentationId: 1, lotNumber: 'A1', expiry: '2028-03', vialsExpected: 10, vialsIntact: 10, vialsBroken: 0, vialsMissing: 0, fridgeId: 3 };
const base = {
  clientKey: '6f1c8f0e-8a0b-4b7e-9d55-2f1f5c3f9a10',
  arrivedAt: new Date(Date.now() - 3_600_000).toISOString(),
  checks: { containerIntact: true, coolantPresent: true, indicator: 'not_triggered', contentsCold: true },
  outcome: 'accepted',
  lines: [line],
};

function fields(input: unknown): string[] {
  const result = shipmentInputSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
}

describe('shipmentInputSchema', () => {
  it('accepts a minimal shipment and reads the month/year expiry (PHAC 2007 §8.2)', () => {
    const parsed = shipmentInputSchema.parse(base);
    expect(parsed.lines[0]!.expiry).to.deep.equal({ expiry: '2028-03-31', dayGiven: false });
    expect(parsed.lines[0]!.accepted).to.equal(true);
    expect(parsed.reading).to.equal(null);
  });

  it('refuses a lot number over the 20 characters GS1 (10) allows', () => {
    expect(fields({ ...base, lines: [{ ...line, lotNumber: 'X'.repeat(21) }] })).to.deep.equal(['lines.0.lotNumber']);
  });

  it('needs a fridge for a line that brings vials in, not for a refused one', () => {
    expect(fields({ ...base, lines: [{ ...line, fridgeId: null }] })).to.deep.equal(['lines.0.fridgeId']);
    expect(fields({ ...base, outcome: 'refused', lines: [{ ...line, fridgeId: null }] })).to.deep.equal([]);
  });

  it('needs a line unless the shipment is refused', () => {
    expect(fields({ ...base, lines: [] })).to.deep.equal(['lines']);
    expect(fields({ ...base, lines: [], outcome: 'refused' })).to.deep.equal([]);
  });

  it('needs a reading to say its unit and where it was taken', () => {
    expect(fields({ ...base, reading: { value: 40 } })).to.deep.equal(['reading.unit', 'reading.place']);
  });
});
