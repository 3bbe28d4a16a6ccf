// Shapes flocks for the API: age and status on the site's calendar, current birds from their history, the next vaccination.
import type { Transaction } from 'sequelize';
import { BirdCount, Flock, House, Product, Programme, Site, User, Vaccination } from '../../database/models/index.js';
import type { BirdCountView } from '../../shared/flocks/bird-count-schemas.js';
import { ageInDays } from '../../shared/flocks/flock-age.js';
import type { FlockSummary, FlockView } from '../../shared/flocks/flock-schemas.js';
import { flockStatus } from '../../shared/flocks/flock-status.js';
import { birdHistory, currentBirds } from '../../shared/flocks/current-birds.js';
import { AppError } from '../http/app-error.js';
import { loadVaccinationViews } from '../vaccinations/vaccination-view.js';
import { siteToday } from './site-today.js';

export const flockIncludes = [
  { model: House, as: 'house', include: [{ model: Site, as: 'site' }] },
  { model: Programme, as: 'programme' },
  { model: BirdCount, as: 'birdCounts' },
];

async function nextVaccinations(flockIds: number[], transaction?: Transaction): Promise<Map<number, Vaccination>> {
  if (!flockIds.length) return new Map();
  const open = await Vaccination.findAll({
    where: { flockId: flockIds, status: ['planned', 'confirmed'] },
    include: [{ model: Product, as: 'product', attributes: ['id', 'name'] }],
    order: [['plannedDate', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  const next = new Map<number, Vaccination>();
  for (const vaccination of open) if (!next.has(vaccination.flockId)) next.set(vaccination.flockId, vaccination);
  return next;
}

/** `flocks` must be loaded with flockIncludes. */
export async function toFlockSummaries(flocks: Flock[], transaction?: Transaction): Promise<FlockSummary[]> {
  const next = await nextVaccinations(flocks.map((f) => f.id), transaction);
  return flocks.map((flock) => {
    const house = flock.house!;
    const site = house.site!;
    const today = siteToday(site);
    const upcoming = next.get(flock.id);
    return {
      id: flock.id,
      name: flock.name,
      siteId: site.id,
      siteName: site.name,
      houseId: house.id,
      houseName: house.name,
      hatchDate: flock.hatchDate,
      placementDate: flock.placementDate,
      plannedDepletionDate: flock.plannedDepletionDate,
      depletedOn: flock.depletedOn ?? null,
      birdsPlaced: flock.birdsPlaced,
      currentBirds: currentBirds(flock.birdsPlaced, flock.birdCounts ?? []),
      ageDays: ageInDays(flock.hatchDate, today),
      status: flockStatus({ placementDate: flock.placementDate, depletedOn: flock.depletedOn ?? null }, today),
      programmeId: flock.programmeId,
      programmeName: flock.programme?.name ?? null,
      nextVaccination: upcoming ? { id: upcoming.id, plannedDate: upcoming.plannedDate, productName: upcoming.product!.name } : null,
    };
  });
}

export async function loadFlockView(id: number, transaction?: Transaction): Promise<FlockView> {
  const flock = await Flock.findByPk(id, { include: flockIncludes, transaction });
  if (!flock) throw AppError.notFound('No such flock.');
  const [summary] = await toFlockSummaries([flock], transaction);
  const counts = (flock.birdCounts ?? []).map((count) => count.get({ plain: true }));
  const recorderIds = [...new Set(counts.map((c) => c.recordedBy).filter((r): r is number => r !== null))];
  const recorders = new Map((await User.findAll({ where: { id: recorderIds }, attributes: ['id', 'name'], transaction })).map((u) => [u.id, u.name]));
  const birdCounts: BirdCountView[] = birdHistory(flock.birdsPlaced, counts).map((c) => ({
    id: c.id,
    countedOn: c.countedOn,
    kind: c.kind,
    birds: c.birds,
    birdsAfter: c.birdsAfter,
    note: c.note,
    recordedBy: c.recordedBy === null ? null : (recorders.get(c.recordedBy) ?? null),
    recordedAt: c.recordedAt.toISOString(),
  }));
  return {
    ...summary!,
    houseCapacity: flock.house!.capacity ?? null,
    notes: flock.notes,
    birdCounts,
    vaccinations: await loadVaccinationViews({ flockId: id }, transaction),
  };
}
