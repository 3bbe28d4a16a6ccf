// What the day knows about one vaccination before anyone acts: flock, site, product, birds, the plan's lots and the water.
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { BirdCount, Flock, Fridge, House, Lot, Presentation, Product, Site, StockBalance, Vaccination, WithdrawalOverride } from '../../database/models/index.js';
import { projectSite } from '../../shared/demand/project-site.js';
import type { ProjectedVaccination } from '../../shared/demand/projection-types.js';
import { currentBirds } from '../../shared/flocks/current-birds.js';
import { ageInDays } from '../../shared/flocks/flock-age.js';
import { withdrawalStatus } from '../../shared/flocks/withdrawal-status.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import type { LotToTake } from '../../shared/vaccination-day/day-views.js';
import { waterVolumeMl } from '../../shared/vaccination-day/mixing.js';
import { loadProjectionInput } from '../demand/projection-inputs.js';
import { AppError } from '../http/app-error.js';
import { depletionDateOf } from '../vaccinations/vaccination-view.js';

export interface VaccinationFacts {
  vaccination: Vaccination;
  flock: Flock;
  house: House;
  site: Site;
  product: Product;
  ageDays: number;
  birds: number;
  withdrawal: ReturnType<typeof withdrawalStatus>;
  heatLimitF: number | null;
  water: { mlPer1000: number; source: 'label' | 'veterinarian' } | null;
  waterMl: number | null;
}

export async function loadFacts(vaccinationId: number, transaction?: Transaction): Promise<VaccinationFacts> {
  const vaccination = await Vaccination.findByPk(vaccinationId, {
    include: [{ model: WithdrawalOverride, as: 'overrides' }, { model: Product, as: 'product' }],
    transaction,
  });
  if (!vaccination) throw AppError.notFound('No such vaccination.');
  const flock = (await Flock.findByPk(vaccination.flockId, { include: [{ model: BirdCount, as: 'birdCounts' }], transaction }))!;
  const house = (await House.findByPk(flock.houseId, { transaction }))!;
  const site = (await Site.findByPk(house.siteId, { transaction }))!;
  const product = vaccination.product!;
  const ageDays = ageInDays(flock.hatchDate, vaccination.plannedDate);
  const birds = currentBirds(flock.birdsPlaced, flock.birdCounts ?? []);
  const withdrawal = withdrawalStatus({
    plannedDate: vaccination.plannedDate,
    depletionDate: depletionDateOf(flock),
    withdrawalDays: product.withdrawalDays,
    overrides: (vaccination.overrides ?? []).map((o) => ({ vaccinationDate: o.vaccinationDate, depletionDate: o.depletionDate, withdrawalDays: o.withdrawalDays })),
  });
  const water = await waterVolumeFor(product.id, ageDays, transaction);
  return {
    vaccination, flock, house, site, product, ageDays, birds, withdrawal,
    heatLimitF: siteSettingsSchema.parse(site.settings ?? {}).sprayHeatLimitF,
    water,
    waterMl: waterVolumeMl({ birds, mlPer1000Birds: water?.mlPer1000 ?? null }),
  };
}

/** The newest entry covering this product and age; none means nobody entered it, and Vialyard shows no volume. */
export async function waterVolumeFor(productId: number, ageDays: number, transaction?: Transaction) {
  const [row] = await Vaccination.sequelize!.query<{ ml: string; source: 'label' | 'veterinarian' }>(
    `SELECT ml_per_1000_birds AS ml, source FROM water_volumes
     WHERE product_id = :productId AND :ageDays BETWEEN age_from_days AND age_to_days ORDER BY entered_at DESC, id DESC LIMIT 1`,
    { replacements: { productId, ageDays }, type: QueryTypes.SELECT, transaction },
  );
  return row ? { mlPer1000: Number(row.ml), source: row.source } : null;
}

/** The planner's vaccinations of a site by id (the same computation purchasing sees); empty when it cannot plan. */
export async function sitePlan(siteId: number): Promise<Map<number, ProjectedVaccination>> {
  try {
    const projection = projectSite((await loadProjectionInput(siteId)).input);
    return new Map(projection.vaccinations.map((v) => [v.id, v]));
  } catch (error) {
    if (error instanceof RangeError) return new Map();
    throw error;
  }
}

/** The plan's allocations from lots in the site's fridges, with where each lot sits. */
export async function lotsToTake(siteId: number, planned: ProjectedVaccination | undefined): Promise<LotToTake[]> {
  const fromStock = (planned?.allocations ?? []).filter((a) => a.source === 'stock');
  if (!fromStock.length) return [];
  const lotIds = fromStock.map((a) => Number(a.lot));
  const lots = new Map((await Lot.findAll({ where: { id: lotIds }, include: [{ model: Presentation, as: 'presentation' }] })).map((l) => [l.id, l]));
  const fridges = await Fridge.findAll({ where: { siteId }, attributes: ['id', 'name'] });
  const fridgeName = new Map(fridges.map((f) => [f.id, f.name]));
  const balances = await StockBalance.findAll({ where: { lotId: lotIds, fridgeId: fridges.map((f) => f.id), vials: { [Op.gt]: 0 } }, order: [['fridgeId', 'ASC']] });
  return fromStock.map((a) => {
    const lot = lots.get(Number(a.lot))!;
    return {
      lotId: lot.id,
      lotNumber: lot.lotNumber,
      expiry: lot.expiry,
      dosesPerVial: lot.presentation!.dosesPerVial,
      vials: a.vials,
      doses: a.doses,
      fridges: balances.filter((b) => b.lotId === lot.id).map((b) => ({ fridgeId: b.fridgeId, fridgeName: fridgeName.get(b.fridgeId) ?? '', vials: b.vials })),
    };
  });
}
