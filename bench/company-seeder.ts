// Seeds a large farm company for the load bench: sites, fridges with a year of five-minute readings (binary COPY, as the
// import does), flocks with their vaccinations, lots received into fridges. `scale` 1 is 20 sites, 100 fridges (10.5 M readings),
// 2,000 flocks, 1,000 lots; smaller scales shrink every count.
import { statfsSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import { BulkCopyReadings } from '../api/readings/bulk-copy-readings.js';
import { refreshReadingHours } from '../api/readings/refresh-reading-hours.js';
import { Flock, Fridge, House, Logger, Lot, Presentation, Product, Site, StockMovement, Vaccination } from '../database/models/index.js';

const DAY = 86_400_000;
const STEP = 5 * 60_000;
export const READINGS_PER_FRIDGE = (365 * DAY) / STEP; // 105,120
/** On-disk bytes per stored reading: the 16-byte row, its tuple header, the key's index entry, the hour rows, WAL (measured roughly; common practice to double). */
const BYTES_PER_READING = 110;

export interface CompanySize {
  sites: number;
  fridges: number;
  flocks: number;
  lots: number;
}

export function companySize(scale: number): CompanySize {
  const at = (n: number) => Math.max(1, Math.round(n * scale));
  return { sites: at(20), fridges: at(100), flocks: at(2_000), lots: at(1_000) };
}

/** Bytes the seeded company needs, and bytes free where the cluster lives; throws when it will not fit. */
export function checkDisk(size: CompanySize, dir: string, log: (line: string) => void): void {
  const needed = size.fridges * READINGS_PER_FRIDGE * BYTES_PER_READING + 200 * 1024 * 1024;
  const stats = statfsSync(dir);
  const free = stats.bavail * stats.bsize;
  const gb = (n: number) => `${(n / 1024 ** 3).toFixed(2)} GB`;
  log(`disk: the company needs about ${gb(needed)}; ${gb(free)} free under ${dir}`);
  if (free < needed * 1.2) throw new Error(`not enough free disk: need about ${gb(needed * 1.2)} with a margin, have ${gb(free)} (try a smaller --scale)`);
}

/** Mulberry32: the same company on every run. */
function random(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export interface SeededCompany {
  siteIds: number[];
  fridgeIds: number[];
  readings: number;
}

export async function seedCompany(sequelize: Sequelize, size: CompanySize, log: (line: string) => void): Promise<SeededCompany> {
  const next = random(20_261_203);
  const now = Date.now();
  const yearStart = now - 365 * DAY;
  const sites = await Site.bulkCreate(Array.from({ length: size.sites }, (_, i) => ({ code: `S${String(i + 1).padStart(2, '0')}`, name: `Bench farm ${i + 1}`, timeZone: 'America/Chicago' })));
  const fridges: Fridge[] = [];
  for (let f = 0; f < size.fridges; f++) {
    fridges.push(await Fridge.create({ siteId: sites[f % sites.length].id, code: `F${String(f + 1).padStart(3, '0')}`, name: `Fridge ${f + 1}`, place: 'Vaccine room' }));
  }

  // A year of five-minute readings per fridge: around 4 °C, with a daily swing and now and then a warm door-open hour.
  let readings = 0;
  for (const [index, fridge] of fridges.entries()) {
    const logger = await Logger.create({ fridgeId: fridge.id, serial: `BL-${fridge.id}`, model: 'Bench logger', role: 'primary' });
    await sequelize.transaction(async (transaction) => {
      const bulk = await BulkCopyReadings.start(transaction, logger.id);
      const batch = [];
      for (let i = 0; i < READINGS_PER_FRIDGE; i++) {
        const at = yearStart + i * STEP;
        const daily = Math.sin((2 * Math.PI * (at % DAY)) / DAY) * 0.6;
        const warm = i % 2_880 < 6 && next() < 0.1 ? 5 : 0;
        batch.push({ at, tempC: 4.2 + daily + warm + (next() - 0.5) * 0.2, line: i + 2 });
        if (batch.length === 10_000) await bulk.add(batch.splice(0));
      }
      await bulk.add(batch);
      if (!(await bulk.finish())) throw new Error('bench readings collided on the key');
      await refreshReadingHours(sequelize, transaction, logger.id, yearStart, yearStart + (READINGS_PER_FRIDGE - 1) * STEP);
    });
    readings += READINGS_PER_FRIDGE;
    if ((index + 1) % 10 === 0 || index + 1 === fridges.length) log(`readings: ${index + 1}/${fridges.length} fridges, ${readings.toLocaleString('en-US')} rows`);
  }

  // Products and packs, then flocks (one house each: a house holds one flock at a time) with planned vaccinations.
  const products = await Product.bulkCreate(Array.from({ length: 8 }, (_, i) => ({ name: `Bench vaccine ${String.fromCharCode(65 + i)}`, kind: 'live', route: 'spray', storageLow: 35, storageHigh: 45, storageUnit: 'F', withdrawalDays: 21 })));
  const presentations = await Presentation.bulkCreate(products.map((p, i) => ({ productId: p.id, dosesPerVial: [1_000, 2_000, 5_000][i % 3], vialsPerPack: 10, packGtin: null, vialGtin: null, unitPrice: 40, proposedBy: null, proposedAt: null })));
  const houses = await House.bulkCreate(Array.from({ length: size.flocks }, (_, i) => ({ siteId: sites[i % sites.length].id, name: `House ${i + 1}`, housing: 'cage' })));
  const flocks = await Flock.bulkCreate(houses.map((house, i) => {
    const placed = now - Math.floor(next() * 300) * DAY;
    return { houseId: house.id, name: `Flock ${i + 1}`, hatchDate: isoDay(placed - 14 * DAY), placementDate: isoDay(placed), birdsPlaced: 5_000 + Math.floor(next() * 40) * 1_000, plannedDepletionDate: isoDay(placed + 500 * DAY), programmeId: null, createdBy: null };
  }));
  const vaccinations = flocks.flatMap((flock, f) => Array.from({ length: 5 }, (_, k) => ({
    flockId: flock.id, programmeStepId: null, productId: products[(f + k) % products.length].id, route: 'spray' as const, plannedDate: isoDay(now + (k * 30 + Math.floor(next() * 30)) * DAY), status: 'planned' as const, confirmedAt: null, createdBy: null,
  })));
  for (let i = 0; i < vaccinations.length; i += 5_000) await Vaccination.bulkCreate(vaccinations.slice(i, i + 5_000));
  log(`flocks: ${flocks.length.toLocaleString('en-US')} with ${vaccinations.length.toLocaleString('en-US')} planned vaccinations`);

  // Lots received into fridges through the ledger (the trigger keeps the balances).
  const lots = await Lot.bulkCreate(Array.from({ length: size.lots }, (_, i) => ({ presentationId: presentations[i % presentations.length].id, lotNumber: `BL${String(i + 1).padStart(5, '0')}`, expiry: isoDay(now + (60 + Math.floor(next() * 600)) * DAY), expiryDayGiven: true, createdBy: null })));
  await StockMovement.bulkCreate(lots.map((lot, i) => ({ lotId: lot.id, kind: 'receive', vials: 20 + Math.floor(next() * 80), fromFridgeId: null, toFridgeId: fridges[i % fridges.length].id, leftAt: null, at: new Date(now - Math.floor(next() * 200) * DAY), sourceKind: 'bench', sourceId: null, recordedBy: null })));
  log(`lots: ${lots.length.toLocaleString('en-US')} received`);
  return { siteIds: sites.map((s) => s.id), fridgeIds: fridges.map((f) => f.id), readings };
}
