import { expect } from 'chai';
import { reorderQuantity } from '../../../shared/inventory/reorder-quantity.js';

describe('reorderQuantity', () => {
  it('covers a 41,000-dose shortfall plus 4,000 safety stock with 30 vials of 2,000 (hand-computed)', () => {
    // 45,000 doses → 22.5 → 23 vials → 3 packs of 10.
    expect(reorderQuantity({ shortfallDoses: 41_000, safetyStock: { kind: 'doses', doses: 4000 }, dosesPerVial: 2000 })).to.deep.equal({
      dosesRequired: 45_000,
      vialsRequired: 23,
      packs: 3,
      vials: 30,
      doses: 60_000,
    });
  });

  it('adds days of cover as safety stock: 5 days × 1,200 doses on a 10,000 shortfall is 16,000 doses, 2 packs of 1,000-dose vials', () => {
    const quantity = reorderQuantity({
      shortfallDoses: 10_000,
      safetyStock: { kind: 'daysOfCover', days: 5, averageDailyDoses: 1200 },
      dosesPerVial: 1000,
    });
    expect(quantity).to.deep.include({ dosesRequired: 16_000, vialsRequired: 16, packs: 2, vials: 20, doses: 20_000 });
  });

  it('honours a different pack size', () => {
    const quantity = reorderQuantity({ shortfallDoses: 45_000, safetyStock: { kind: 'doses', doses: 0 }, dosesPerVial: 20_000, vialsPerPack: 1 });
    expect(quantity).to.deep.include({ vialsRequired: 3, packs: 3, vials: 3, doses: 60_000 });
  });

  it('orders nothing when there is no shortfall and no safety stock', () => {
    expect(reorderQuantity({ shortfallDoses: 0, safetyStock: { kind: 'doses', doses: 0 }, dosesPerVial: 1000 })).to.deep.include({ packs: 0, vials: 0 });
  });
});
