import { expect } from 'chai';
import { choosePresentation, packOrder } from '../../../shared/demand/choose-presentation.js';

const pack = (id: number, dosesPerVial: number, unitPrice: number | null, vialsPerPack = 10) => ({ id, productId: 1, label: `P${id}`, dosesPerVial, vialsPerPack, unitPrice });

describe('packOrder and choosePresentation', () => {
  it('rounds up to whole packs of 10 vials (common practice: vials come 10 to a pack): 23 vials → 3 packs, 30 vials', () => {
    const order = packOrder(pack(1, 1000, 10), [23_000], 0);
    expect(order).to.deep.include({ vialsRequired: 23, packs: 3, vials: 30, doses: 30_000, value: 300 });
  });

  it('opens vials per shortfall: two houses 5,000 short each need two 20,000-dose vials, not one (hand-computed)', () => {
    expect(packOrder(pack(1, 20_000, null, 1), [5000, 5000], 0).vialsRequired).to.equal(2);
  });

  it('adds the safety-stock top-up in whole vials', () => {
    expect(packOrder(pack(1, 2000, null), [3000], 2500)).to.deep.include({ vialsRequired: 4, packs: 1 });
  });

  it('takes purchasing’s preferred pack when set', () => {
    expect(choosePresentation([pack(1, 1000, 5), pack(2, 20_000, 50)], 1, [20_000], 0)!.presentation.id).to.equal(1);
  });

  it('otherwise chooses the cheapest order when every pack has a price', () => {
    // 20,000 doses: 2 packs of 1,000-dose vials at 12/vial = 240; 1 pack of 20,000-dose vials at 30/vial = 300.
    expect(choosePresentation([pack(2, 20_000, 30), pack(1, 1000, 12)], null, [20_000], 0)!.presentation.id).to.equal(1);
  });

  it('and the fewest doses bought when a price is missing, then fewer packs, then the lower id', () => {
    expect(choosePresentation([pack(2, 20_000, null), pack(1, 1000, 12)], null, [12_000], 0)!.presentation.id).to.equal(1);
    expect(choosePresentation([pack(5, 1000, null), pack(3, 1000, null)], null, [5000], 0)!.presentation.id).to.equal(3);
  });

  it('has nothing to choose without a pack', () => {
    expect(choosePresentation([], null, [1000], 0)).to.equal(null);
  });
});
