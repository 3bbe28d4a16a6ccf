import { expect } from 'chai';
import { projectSite } from '../../../shared/demand/project-site.js';
import type { ProductPlanning, ProjectionInput, ProjectionLot, ProjectionVaccination } from '../../../shared/demand/projection-types.js';

const today = '2026-04-01';

const lot = (id: number, vials: number, expiry: string, extra: Partial<ProjectionLot> = {}): ProjectionLot => ({
  id,
  lotId: id,
  label: `LOT${id}`,
  source: 'stock',
  productId: 1,
  presentationId: 10,
  dosesPerVial: 20_000,
  vials,
  expiry,
  status: 'usable',
  availableFrom: null,
  ...extra,
});

const vaccination = (id: number, plannedDate: string, birds = 20_000, productId = 1): ProjectionVaccination => ({
  id,
  flockId: id,
  flockName: `F${id}`,
  houseName: `House ${id}`,
  productId,
  plannedDate,
  birds,
});

const planning = (extra: Partial<ProductPlanning> = {}): ProductPlanning => ({
  productId: 1,
  productName: 'Spray vaccine',
  safetyStock: { kind: 'doses', doses: 0 },
  supplier: { id: 5, name: 'Supplier', leadTimeDays: 10 },
  presentationId: null,
  ...extra,
});

function input(extra: Partial<ProjectionInput> = {}): ProjectionInput {
  return {
    today,
    horizonDays: 180,
    overagePercent: 0,
    expiryAlertDays: [30, 60, 90],
    reorderMarginDays: 3,
    lots: [],
    vaccinations: [],
    presentations: [{ id: 10, productId: 1, label: 'Spray vaccine, 20,000 doses × 10 vials', dosesPerVial: 20_000, vialsPerPack: 10, unitPrice: 250 }],
    products: [planning()],
    ...extra,
  };
}

describe('projectSite', () => {
  it('gives a house of 20,000 birds one 20,000-dose vial (common practice: one dose per bird)', () => {
    const projection = projectSite(input({ lots: [lot(1, 3, '2026-12-31')], vaccinations: [vaccination(1, '2026-05-01')] }));
    expect(projection.vaccinations[0]).to.deep.include({ dosesNeeded: 20_000, dosesAllocated: 20_000, dosesWasted: 0, shortfallDoses: 0 });
    expect(projection.vaccinations[0]!.allocations).to.deep.equal([{ lot: 1, label: 'LOT1', source: 'stock', vials: 1, doses: 20_000 }]);
    expect(projection.suggestions).to.deep.equal([]);
  });

  it('adds the site’s overage: 20,000 birds at 5 % need 21,000 doses, so a second vial opens (hand-computed)', () => {
    const projection = projectSite(input({ overagePercent: 5, lots: [lot(1, 3, '2026-12-31')], vaccinations: [vaccination(1, '2026-05-01')] }));
    expect(projection.vaccinations[0]).to.deep.include({ dosesNeeded: 21_000, dosesAllocated: 40_000, dosesWasted: 19_000 });
  });

  it('uses a month/year lot through the month’s last day and not a day after (PHAC 2007 §8.2)', () => {
    // The store keeps a month/year expiry as the month's last day; the projection sees that day.
    const lots = [lot(1, 1, '2026-05-31')];
    expect(projectSite(input({ lots, vaccinations: [vaccination(1, '2026-05-31')] })).vaccinations[0]!.shortfallDoses).to.equal(0);
    expect(projectSite(input({ lots, vaccinations: [vaccination(1, '2026-06-01')] })).vaccinations[0]!.shortfallDoses).to.equal(20_000);
  });

  it('alerts an uncovered vaccination with its date, flock and missing doses', () => {
    const projection = projectSite(input({ lots: [lot(1, 1, '2026-12-31')], vaccinations: [vaccination(1, '2026-05-01'), vaccination(2, '2026-05-20')] }));
    expect(projection.alerts.uncovered).to.deep.equal([
      { vaccinationId: 2, plannedDate: '2026-05-20', flockId: 2, flockName: 'F2', houseName: 'House 2', productId: 1, productName: 'Spray vaccine', shortfallDoses: 20_000 },
    ]);
  });

  it('suggests an order by the first shortfall − lead time − margin, covering the shortfall in whole packs (hand-computed; common practice: 10 vials a pack)', () => {
    const projection = projectSite(input({ lots: [lot(1, 1, '2026-12-31')], vaccinations: [vaccination(1, '2026-05-01'), vaccination(2, '2026-05-20')] }));
    expect(projection.suggestions).to.have.length(1);
    // 2026-05-20 − 10 days lead time − 3 days margin = 2026-05-07; one vial short → 1 pack of 10 vials.
    expect(projection.suggestions[0]).to.deep.include({
      needDate: '2026-05-20',
      orderBy: '2026-05-07',
      urgent: false,
      shortfallDoses: 20_000,
      topUpDoses: 0,
      vialsRequired: 1,
      packs: 1,
      vials: 10,
      doses: 200_000,
      value: 2500,
      supplierId: 5,
      presentationId: 10,
    });
  });

  it('marks the suggestion urgent when the order-by date is today or past', () => {
    const projection = projectSite(input({ vaccinations: [vaccination(1, '2026-04-10')] }));
    expect(projection.suggestions[0]).to.deep.include({ orderBy: '2026-03-28', urgent: true });
  });

  it('adds safety stock in doses to the quantity, and alerts stock after the planned vaccinations below it', () => {
    const products = [planning({ safetyStock: { kind: 'doses', doses: 30_000 } })];
    const projection = projectSite(input({ products, lots: [lot(1, 2, '2026-12-31')], vaccinations: [vaccination(1, '2026-05-01')] }));
    // 40,000 on hand − 20,000 used = 20,000 left, under 30,000 from the vaccination day on.
    expect(projection.alerts.belowSafety).to.deep.equal([{ productId: 1, productName: 'Spray vaccine', from: '2026-05-01', lowestDoses: 20_000, safetyStockDoses: 30_000 }]);
    expect(projection.suggestions[0]).to.deep.include({ needDate: '2026-05-01', shortfallDoses: 0, topUpDoses: 10_000, vialsRequired: 1, packs: 1 });
  });

  it('turns days of cover into doses at the horizon’s average daily need: 9 vaccinations of 20,000 in 180 days, 30 days → 30,000 (hand-computed)', () => {
    const vaccinations = Array.from({ length: 9 }, (_, i) => vaccination(i + 1, `2026-0${5 + Math.floor(i / 3)}-${String(10 + (i % 3)).padStart(2, '0')}`));
    const products = [planning({ safetyStock: { kind: 'days', days: 30 } })];
    const projection = projectSite(input({ products, lots: [lot(1, 20, '2026-12-31')], vaccinations }));
    expect(projection.products[0]!.safetyStockDoses).to.equal(30_000);
  });

  it('counts an open order from its expected date and no sooner', () => {
    const order = lot(99, 10, '9999-12-31', { id: 'order-7', lotId: null, source: 'order', label: 'PO-7', availableFrom: '2026-05-10' });
    const projection = projectSite(input({ lots: [order], vaccinations: [vaccination(1, '2026-05-09'), vaccination(2, '2026-05-10')] }));
    expect(projection.vaccinations.map((v) => v.shortfallDoses)).to.deep.equal([20_000, 0]);
    expect(projection.products[0]).to.deep.include({ dosesIncoming: 200_000, dosesOnHand: 0 });
  });

  it('plans an overdue vaccination as if today, so its vials stay set aside', () => {
    const projection = projectSite(input({ lots: [lot(1, 1, '2026-04-01')], vaccinations: [vaccination(1, '2026-03-20')] }));
    expect(projection.vaccinations[0]).to.deep.include({ overdue: true, shortfallDoses: 0 });
  });

  it('lists lots on hand expiring within 30, 60 and 90 days in the smallest window, with their value; expired ones in window 0', () => {
    const projection = projectSite(
      input({ lots: [lot(1, 2, '2026-04-20'), lot(2, 1, '2026-05-25'), lot(3, 1, '2026-06-29'), lot(4, 1, '2026-07-15'), lot(5, 1, '2026-03-31'), lot(6, 1, '2026-04-15', { status: 'hold' })] }),
    );
    expect(projection.alerts.expiring.map((a) => [a.lotId, a.daysLeft, a.window, a.value, a.onHold])).to.deep.equal([
      [5, -1, 0, 250, false],
      [6, 14, 30, 250, true],
      [1, 19, 30, 500, false],
      [2, 54, 60, 250, false],
      [3, 89, 90, 250, false],
    ]);
  });

  it('lists lots that will expire before any planned use, with the doses and the value lost at the unit price', () => {
    // Lot 1 expires 2026-05-15 but the vaccination is on 2026-06-01: its 2 vials are lost, and the need is met from lot 2.
    const projection = projectSite(input({ lots: [lot(1, 2, '2026-05-15'), lot(2, 1, '2026-12-31')], vaccinations: [vaccination(1, '2026-06-01')] }));
    expect(projection.alerts.expireUnused).to.deep.equal([
      { lotId: 1, lotNumber: 'LOT1', productId: 1, productName: 'Spray vaccine', presentationId: 10, expiry: '2026-05-15', vials: 2, doses: 40_000, valueLost: 500, neededAfterExpiry: true },
    ]);
  });

  it('does not count held lots as usable stock, nor list them as lost', () => {
    const projection = projectSite(input({ lots: [lot(1, 5, '2026-12-31', { status: 'hold' })], vaccinations: [vaccination(1, '2026-05-01')] }));
    expect(projection.vaccinations[0]!.shortfallDoses).to.equal(20_000);
    expect(projection.products[0]).to.deep.include({ dosesOnHand: 0, dosesOnHold: 100_000 });
    expect(projection.alerts.expireUnused).to.deep.equal([]);
  });

  it('leaves vaccinations beyond the horizon out', () => {
    expect(projectSite(input({ vaccinations: [vaccination(1, '2026-09-28'), vaccination(2, '2026-09-29')] })).vaccinations.map((v) => v.id)).to.deep.equal([1]);
  });

  it('orders by the day the need arrives without a supplier, and says none is set', () => {
    const projection = projectSite(input({ products: [planning({ supplier: null })], vaccinations: [vaccination(1, '2026-06-01')] }));
    expect(projection.suggestions[0]).to.deep.include({ supplierId: null, leadTimeDays: null, orderBy: '2026-05-29' });
  });
});
