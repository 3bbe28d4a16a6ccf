// Test data for flocks and demand: houses, flocks, programmes, vaccinations, lots in a fridge, dates counted from the site's today.
import { randomUUID } from 'node:crypto';
import {
  Flock,
  Fridge,
  House,
  Lot,
  Presentation,
  Product,
  Programme,
  ProgrammeStep,
  Site,
  StockMovement,
  Supplier,
  Vaccination,
} from '../../database/models/index.js';
import { addDays } from '../../shared/planning/iso-date.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';

/** The site's calendar day `days` from today (negative: in the past). */
export function siteDay(site: Site, days = 0): string {
  return addDays(siteLocalDate(new Date(), site.timeZone), days);
}

export async function createHouse(site: Site, name = `House ${randomUUID().slice(0, 4)}`): Promise<House> {
  return House.create({ siteId: site.id, name, housing: 'cage' });
}

export async function createProduct(options: { name?: string; withdrawalDays?: number } = {}): Promise<Product> {
  return Product.create({
    name: options.name ?? `Test vaccine ${randomUUID().slice(0, 6)}`,
    kind: 'live',
    route: 'spray',
    storageLow: 35,
    storageHigh: 45,
    storageUnit: 'F',
    withdrawalDays: options.withdrawalDays ?? 21,
  });
}

export async function createPresentation(product: Product, dosesPerVial: number, options: { vialsPerPack?: number; unitPrice?: number | null } = {}): Promise<Presentation> {
  return Presentation.create({
    productId: product.id,
    dosesPerVial,
    vialsPerPack: options.vialsPerPack ?? 10,
    packGtin: null,
    vialGtin: null,
    unitPrice: options.unitPrice === undefined ? 40 : options.unitPrice,
    proposedBy: null,
    proposedAt: null,
  });
}

export async function createSupplier(leadTimeDays = 5, orderEmail = `orders-${randomUUID().slice(0, 6)}@supplier.example`): Promise<Supplier> {
  return Supplier.create({ name: `Supplier ${randomUUID().slice(0, 6)}`, orderEmail, leadTimeDays });
}

export async function createFlock(
  house: House,
  options: { name?: string; hatchDays?: number; placementDays?: number; depletionDays?: number | null; birds?: number; programmeId?: number | null } = {},
): Promise<Flock> {
  const site = (await Site.findByPk(house.siteId))!;
  return Flock.create({
    houseId: house.id,
    name: options.name ?? `Flock ${randomUUID().slice(0, 4)}`,
    hatchDate: siteDay(site, options.hatchDays ?? -100),
    placementDate: siteDay(site, options.placementDays ?? -90),
    birdsPlaced: options.birds ?? 20_000,
    plannedDepletionDate: options.depletionDays === null ? null : siteDay(site, options.depletionDays ?? 300),
    programmeId: options.programmeId ?? null,
    createdBy: null,
  });
}

export async function createVaccination(flock: Flock, product: Product, plannedDate: string, status: 'planned' | 'confirmed' = 'planned'): Promise<Vaccination> {
  return Vaccination.create({
    flockId: flock.id,
    programmeStepId: null,
    productId: product.id,
    route: 'spray',
    plannedDate,
    status,
    confirmedAt: status === 'confirmed' ? new Date() : null,
    createdBy: null,
  });
}

export async function createProgramme(steps: { product: Product; ageValue: number; ageUnit?: 'days' | 'weeks' }[], name = `Programme ${randomUUID().slice(0, 4)}`): Promise<Programme> {
  const programme = await Programme.create({ name, createdBy: null });
  for (const [index, step] of steps.entries()) {
    await ProgrammeStep.create({ programmeId: programme.id, position: index + 1, productId: step.product.id, ageValue: step.ageValue, ageUnit: step.ageUnit ?? 'days', route: 'spray' });
  }
  return programme;
}

export async function createSiteFridge(site: Site): Promise<Fridge> {
  return Fridge.create({ siteId: site.id, code: `${site.code}-F${Math.floor(Math.random() * 900 + 100)}`, name: 'Test fridge', place: 'Test room' });
}

/** A lot received into the fridge through the ledger (a receive movement), as receiving would leave it. */
export async function stockLot(fridge: Fridge, presentation: Presentation, vials: number, expiry: string, options: { expiryDayGiven?: boolean; lotNumber?: string } = {}): Promise<Lot> {
  const lot = await Lot.create({
    presentationId: presentation.id,
    lotNumber: options.lotNumber ?? `L${randomUUID().slice(0, 6).toUpperCase()}`,
    expiry,
    expiryDayGiven: options.expiryDayGiven ?? true,
    createdBy: null,
  });
  await StockMovement.create({ lotId: lot.id, kind: 'receive', vials, fromFridgeId: null, toFridgeId: fridge.id, leftAt: null, at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null });
  return lot;
}
