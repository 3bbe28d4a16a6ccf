import { expect } from 'chai';
import { transferCandidates } from '../../../shared/demand/transfer-candidates.js';

const spare = (lotId: number, expiry: string, spareVials: number, productId = 1) => ({
  siteId: 2, siteName: 'Other', lotId, lotNumber: `L${lotId}`, productId, dosesPerVial: 5000, expiry, spareVials,
});

describe('transferCandidates', () => {
  it('offers the same product’s spare lots still in date on the short day, earliest expiry first, with the vials that cover the shortfall', () => {
    const candidates = transferCandidates({ productId: 1, firstShortfallDate: '2026-05-01', shortfallDoses: 12_000 }, [
      spare(1, '2026-09-30', 10),
      spare(2, '2026-04-30', 10),
      spare(3, '2026-06-30', 1),
      spare(4, '2026-06-30', 10, 9),
    ]);
    expect(candidates.map((c) => [c.lotId, c.suggestedVials])).to.deep.equal([
      [3, 1],
      [1, 3],
    ]);
  });
});
