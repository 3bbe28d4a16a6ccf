// Where a scan goes on the form, with the BWIPP and Solidsoft wiki element strings as the scanned data.
import { expect } from 'chai';
import { placeScan } from '../../../shared/receiving/place-scan.js';
import type { ProductView } from '../../../shared/catalogue/product-schemas.js';

const NOW = new Date('2026-12-02T12:00:00Z');
const GS = '\u001d';
const products = [
  { id: 1, name: 'P', presentations: [{ id: 10, packGtin: '09521234543213', vialGtin: '05060917510011', vialsPerPack: 10 }] },
] as unknown as ProductView[];

describe('placeScan', () => {
  // BWIPP wiki, "GS1 Application Identifier Standard Format": (01)09521234543213(17)100101(10)123ABC(21)1234567890.
  const bwipp = `01095212345432131710010110123ABC${GS}211234567890`;

  it('fills the first expected line of that presentation still without a lot', () => {
    const placement = placeScan(bwipp, [{ presentationId: 10, lotNumber: 'OLD1' }, { presentationId: 10, lotNumber: '' }], products, NOW);
    expect(placement).to.deep.equal({ kind: 'fill', line: 1, presentationId: 10, fields: { scan: bwipp, lotNumber: '123ABC', expiry: '2010-01-01' } });
  });

  it('adds a line of one pack when no line waits for it', () => {
    expect(placeScan(bwipp, [], products, NOW)).to.deep.include({ kind: 'add', presentationId: 10, vialsExpected: 10 });
  });

  it('a vial-level GTIN with day 00 gives a month/year expiry and a line of one vial (Solidsoft GS1 parser wiki, "GS1 Data Example")', () => {
    const solidsoft = `010506091751001110628S93R${GS}17241000218898847482518646`;
    expect(placeScan(solidsoft, [], products, NOW)).to.deep.equal({
      kind: 'add', presentationId: 10, vialsExpected: 1, fields: { scan: solidsoft, lotNumber: '628S93R', expiry: '2024-10' },
    });
  });

  it('points at the line when the same lot is scanned again', () => {
    expect(placeScan(bwipp, [{ presentationId: 10, lotNumber: '123abc' }], products, NOW)).to.deep.equal({ kind: 'already-listed', line: 0 });
  });

  it('an unknown GTIN is offered for proposal with what was read', () => {
    // GTIN-14 09506000134352 has a valid check digit (GS1 "How to calculate a check digit manually").
    expect(placeScan('(01)09506000134352(10)ZZ9(17)280300', [], products, NOW)).to.deep.equal({
      kind: 'unknown-gtin', gtin: '09506000134352', fields: { scan: '(01)09506000134352(10)ZZ9(17)280300', lotNumber: 'ZZ9', expiry: '2028-03' },
    });
  });

  it('says what is wrong with unreadable data, and asks for a GTIN when there is none', () => {
    expect(placeScan('(01)09506000134353', [], products, NOW)).to.include({ kind: 'error' });
    expect(placeScan('(10)ABC', [], products, NOW)).to.include({ kind: 'no-gtin' });
  });
});
