// Invented flocks-and-demand data for the demo: programmes, flocks in the demo houses with their planned vaccinations,
// opening stock and a few weeks of use, so purchasing sees covered vaccinations, one shortfall, expiring lots and a flagged date.
import type { Transaction } from 'sequelize';
import { reconcileProgramme } from '../../shared/flocks/reconcile-programme.js';
import { addDays } from '../../shared/planning/iso-date.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { siteTime } from './demo-clock.js';
import {
  BirdCount, Flock, Fridge, House, Lot, Presentation, Product, ProductStockSetting, Programme, ProgrammeStep, PurchaseOrder, PurchaseOrderLine, Site, StockCount, StockCountLine,
  StockMovement, Supplier, User, Vaccination,
} from '../models/index.js';

type StepSpec = [productName: string, ageValue: number, ageUnit: 'days' | 'weeks', route: 'spray' | 'drinking_water' | 'wing_web' | 'injection', notes?: string];

const ND = 'Meadowline ND spray';
const IB = 'Fernhollow IB drinking-water vaccine';
const AE = 'Tallgrass AE wing-web vaccine';
const EMULSION = 'Cinderfield ND-IB emulsion';

const programmes: { name: string; notes: string; steps: StepSpec[] }[] = [
  {
    name: 'Layer boosters, lay period',
    notes: 'Boosters every twelve weeks in lay; the flock veterinarian adjusts to the field situation.',
    steps: [18, 30, 42, 54, 66, 78, 90].flatMap((week): StepSpec[] => [
      [ND, week, 'weeks', 'spray', 'Coarse spray'],
      [IB, week + 1, 'weeks', 'drinking_water'],
    ]),
  },
  {
    name: 'Pullet rearing',
    notes: 'From placement at day old to transfer at 16 weeks.',
    steps: [
      [IB, 10, 'days', 'drinking_water'],
      [ND, 14, 'days', 'spray'],
      [IB, 4, 'weeks', 'drinking_water'],
      [ND, 6, 'weeks', 'spray'],
      [AE, 8, 'weeks', 'wing_web'],
      [IB, 11, 'weeks', 'drinking_water'],
      [EMULSION, 12, 'weeks', 'injection', 'Before transfer to lay'],
    ],
  },
];

/** Days are counted from each site's today, so the demo looks the same whenever it is seeded. */
const flocks = [
  { site: 'LKN', house: 'House 1', name: 'H1-2025B', hatch: -280, placement: -168, birds: 24_000, depletion: 420, programme: 'Layer boosters, lay period', losses: [[-120, 96], [-60, 71], [-7, 33]] },
  { site: 'LKN', house: 'House 2', name: 'H2-2025A', hatch: -525, placement: -413, birds: 22_000, depletion: 25, programme: 'Layer boosters, lay period', losses: [[-30, 140]] },
  { site: 'LKN', house: 'House 3', name: 'H3-2026A', hatch: -126, placement: -14, birds: 20_000, depletion: 448, programme: 'Layer boosters, lay period', losses: [] },
  { site: 'FCP', house: 'Pullet barn A', name: 'PA-2026-03', hatch: -30, placement: -30, birds: 18_000, depletion: 82, programme: 'Pullet rearing', losses: [[-20, 210]] },
  { site: 'FCP', house: 'Pullet barn B', name: 'PB-2026-05', hatch: 40, placement: 40, birds: 18_000, depletion: 152, programme: 'Pullet rearing', losses: [] },
] as const;

/** Why a Larkmoor North step before today is closed: given, on the paper record of the time. */
export const PAPER_RECORD = 'Given before Larkmoor North recorded vaccinations in Vialyard; see the paper record in the farm office.';

/**
 * Opening stock counted into the fridges (an adjustment in), by pack doses and expiry in days from today. TAE0611 is the
 * lot the veterinarian releases on condition of using it first, at the next wing-web vaccination (barn A at 8 weeks,
 * 26 days from today): it expires two weeks after that, so the condition can be met.
 */
const openingStock = [
  { site: 'LKN', fridge: 'LKN-F1', product: ND, doses: 5000, vials: 24, expiry: 240, lot: 'MND5120' },
  { site: 'LKN', fridge: 'LKN-F2', product: IB, doses: 2500, vials: 6, expiry: 20, lot: 'FIB0815' },
  { site: 'FCP', fridge: 'FCP-F1', product: ND, doses: 1000, vials: 60, expiry: 200, lot: 'MND4890' },
  { site: 'FCP', fridge: 'FCP-F1', product: IB, doses: 2500, vials: 40, expiry: 210, lot: 'FIB1203' },
  { site: 'FCP', fridge: 'FCP-F2', product: AE, doses: 1000, vials: 10, expiry: 40, lot: 'TAE0611' },
  { site: 'FCP', fridge: 'FCP-F2', product: AE, doses: 1000, vials: 40, expiry: 320, lot: 'TAE0702' },
  { site: 'FCP', fridge: 'FCP-F1', product: EMULSION, doses: 1000, vials: 40, expiry: 300, lot: 'CNE0420' },
  // Left over from the last flock's injections before lay; nothing needs the emulsion before it expires, so purchasing shows it lost.
  { site: 'FCP', fridge: 'FCP-F1', product: EMULSION, doses: 1000, vials: 6, expiry: 30, lot: 'CNE0311' },
] as const;

/**
 * Twelve weeks of spray use at Larkmoor North, in vials of the lot below, oldest week first (the history a safety stock is
 * proposed from): one morning a week, the last a week ago, before the vaccine room fridge's warm spell held the lot.
 */
const HISTORY_LOT = 'MND5120';
const weeklyUse = [4, 0, 3, 5, 0, 4, 2, 0, 5, 4, 3, 6];

export async function seedDemoFlocks(transaction: Transaction): Promise<void> {
  const vet = (await User.findOne({ where: { email: 'vet@larkmoor.example' }, transaction }))!;
  const buyer = (await User.findOne({ where: { email: 'purchasing@larkmoor.example' }, transaction }))!;
  const storage = (await User.findOne({ where: { email: 'storage@larkmoor.example' }, transaction }))!;
  const productIds = new Map((await Product.findAll({ transaction })).map((p) => [p.name, p.id]));
  const productId = (name: string) => productIds.get(name)!;

  const programmeIds = new Map<string, number>();
  for (const spec of programmes) {
    const programme = await Programme.create({ name: spec.name, notes: spec.notes, createdBy: vet.id }, { transaction });
    programmeIds.set(spec.name, programme.id);
    for (const [index, [product, ageValue, ageUnit, route, notes]] of spec.steps.entries()) {
      await ProgrammeStep.create({ programmeId: programme.id, position: index + 1, productId: productId(product), ageValue, ageUnit, route, notes: notes ?? '' }, { transaction });
    }
  }

  const sites = new Map((await Site.findAll({ transaction })).map((s) => [s.code, s]));
  const today = (code: string) => siteLocalDate(new Date(), sites.get(code)!.timeZone);

  for (const spec of flocks) {
    const site = sites.get(spec.site)!;
    const house = (await House.findOne({ where: { siteId: site.id, name: spec.house }, transaction }))!;
    await house.update({ capacity: spec.site === 'LKN' ? 25_000 : 20_000 }, { transaction });
    const day = (offset: number) => addDays(today(spec.site), offset);
    const flock = await Flock.create(
      {
        houseId: house.id, programmeId: programmeIds.get(spec.programme)!, name: spec.name, hatchDate: day(spec.hatch), placementDate: day(spec.placement),
        birdsPlaced: spec.birds, plannedDepletionDate: day(spec.depletion), createdBy: buyer.id,
      },
      { transaction },
    );
    for (const [offset, birds] of spec.losses) {
      await BirdCount.create({ flockId: flock.id, countedOn: day(offset), kind: 'mortality', birds, note: 'Weekly mortality', recordedBy: buyer.id }, { transaction });
    }
    // The same generation the API runs when a flock gets its programme.
    const steps = await ProgrammeStep.findAll({ where: { programmeId: flock.programmeId! }, transaction });
    const { create } = reconcileProgramme({ hatchDate: flock.hatchDate, placementDate: flock.placementDate, lastDay: flock.plannedDepletionDate, today: today(spec.site), steps, existing: [] });
    // It generates the steps already past as overdue. Larkmoor North's were given while its crew kept paper records
    // (its first record in Vialyard is today's booster), so they are closed with that reason rather than shown as
    // missed; Fennel Creek's past steps are told in demo-vaccination-day.ts.
    const given = (c: (typeof create)[number]) => c.overdue && spec.site === 'LKN';
    await Vaccination.bulkCreate(
      create.map((c) => ({
        flockId: flock.id, programmeStepId: c.stepId, productId: c.productId, route: c.route, plannedDate: c.plannedDate, notes: c.notes, createdBy: buyer.id,
        ...(given(c) ? { status: 'cancelled' as const, cancelledBy: buyer.id, cancelledAt: new Date(), cancelReason: PAPER_RECORD } : {}),
      })),
      { transaction },
    );
  }

  const packs = await Presentation.findAll({ transaction });
  const pack = (product: string, doses: number) => packs.find((p) => p.productId === productId(product) && p.dosesPerVial === doses)!;
  const lots = new Map<string, Lot>();
  // Thirteen weeks ago, in the morning on each site's clock; the fridges' logger readings go back past it. Each fridge's
  // opening count is a count record too, so the fridge pages date its last count from it (not "never counted").
  const countedAt = (code: string) => siteTime(sites.get(code)!.timeZone, -13 * 7, '08:30');
  const openingCounts = new Map<string, StockCount>();
  for (const stock of openingStock) {
    const fridge = (await Fridge.findOne({ where: { code: stock.fridge }, transaction }))!;
    if (!openingCounts.has(stock.fridge)) {
      openingCounts.set(stock.fridge, await StockCount.create({ fridgeId: fridge.id, countedBy: storage.id, countedAt: countedAt(stock.site), notes: 'Opening count.' }, { transaction }));
    }
    const count = openingCounts.get(stock.fridge)!;
    const lot = await Lot.create({ presentationId: pack(stock.product, stock.doses).id, lotNumber: stock.lot, expiry: addDays(today(stock.site), stock.expiry), createdBy: storage.id }, { transaction });
    lots.set(stock.lot, lot);
    // The history lot was counted with the vials it has issued since, so `vials` is what is on hand now.
    const issuedSince = stock.lot === HISTORY_LOT ? weeklyUse.reduce((sum, v) => sum + v, 0) : 0;
    const counted = stock.vials + issuedSince;
    await StockCountLine.create({ stockCountId: count.id, lotId: lot.id, expected: 0, counted, reason: 'Opening count' }, { transaction, fields: ['stockCountId', 'lotId', 'expected', 'counted', 'reason'] });
    await StockMovement.create(
      { lotId: lot.id, kind: 'adjust', vials: counted, fromFridgeId: null, toFridgeId: fridge.id, leftAt: null, at: count.countedAt, sourceKind: 'stock_count', sourceId: count.id, reason: 'Opening count', recordedBy: storage.id },
      { transaction },
    );
  }

  const roomFridge = (await Fridge.findOne({ where: { code: 'LKN-F1' }, transaction }))!;
  for (const [i, vials] of weeklyUse.entries()) {
    if (!vials) continue;
    // Whole weeks back from today, so each falls in the week `weeklyDemand` counts it in (the last one 7 days ago).
    const at = siteTime(sites.get('LKN')!.timeZone, -(12 - i) * 7, '06:40');
    await StockMovement.create(
      { lotId: lots.get(HISTORY_LOT)!.id, kind: 'issue', vials, fromFridgeId: roomFridge.id, toFridgeId: null, leftAt: new Date(at.getTime() - 20 * 60_000), at, sourceKind: 'demo_history', sourceId: null, reason: 'Vaccination (demo history)', recordedBy: storage.id },
      { transaction },
    );
  }

  // An order already on its way covers the drinking-water vaccinations from about six weeks out; the nearer ones stay short.
  const coldline = (await Supplier.findOne({ where: { name: 'Coldline Farm Supply' }, transaction }))!;
  const north = sites.get('LKN')!;
  const order = await PurchaseOrder.create(
    { siteId: north.id, supplierId: coldline.id, reference: 'PO-2615', expectedDate: addDays(today('LKN'), 40), carrier: 'Frostway Courier', notes: 'Drinking-water vaccine for the next round of layer boosters.', createdBy: buyer.id },
    { transaction },
  );
  await PurchaseOrderLine.create({ purchaseOrderId: order.id, lineNo: 1, presentationId: pack(IB, 10_000).id, packs: 1 }, { transaction });

  await ProductStockSetting.create(
    { siteId: sites.get('LKN')!.id, productId: productId(ND), safetyStockKind: 'days', safetyStockValue: 14, supplierId: coldline.id, presentationId: null, serviceLevel: null, updatedBy: buyer.id },
    { transaction },
  );
}
