// Shapes flocks for the API: age and status on the site's calendar, current birds from their history, the next and overdue
// vaccinations, and the schedule of every programme step with its state.
import type { Transaction } from 'sequelize';
import { BirdCount, Flock, House, Product, Programme, ProgrammeStep, Site, User, Vaccination } from '../../database/models/index.js';
import type { BirdCountView } from '../../shared/flocks/bird-count-schemas.js';
import { ageInDays } from '../../shared/flocks/flock-age.js';
import { flockSchedule, type ScheduleStep } from '../../shared/flocks/flock-schedule.js';
import type { FlockSummary, FlockView } from '../../shared/flocks/flock-schemas.js';
import { flockStatus } from '../../shared/flocks/flock-status.js';
import { birdHistory, currentBirds } from '../../shared/flocks/current-birds.js';
import { AppError } from '../http/app-error.js';
import { depletionDateOf, loadVaccinationViews } from '../vaccinations/vaccination-view.js';
import { siteToday } from './site-today.js';

export const flockIncludes = [
  { model: House, as: 'house', include: [{ model: Site, as: 'site' }] },
  { model: Programme, as: 'programme' },
  { model: BirdCount, as: 'birdCounts' },
];

interface OpenVaccinations {
  next: Vaccination | undefined;
  overdue: number;
}

/** Per flock: the first open vaccination on or after the site's today, and how many open ones are already past it. */
async function openVaccinations(flocks: Flock[], transaction?: Transaction): Promise<Map<number, OpenVaccinations>> {
  if (!flocks.length) return new Map();
  const open = await Vaccination.findAll({
    where: { flockId: flocks.map((f) => f.id), status: ['planned', 'confirmed'] },
    include: [{ model: Product, as: 'product', attributes: ['id', 'name'] }],
    order: [['plannedDate', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  const todayOf = new Map(flocks.map((f) => [f.id, siteToday(f.house!.site!)]));
  const found = new Map<number, OpenVaccinations>(flocks.map((f) => [f.id, { next: undefined, overdue: 0 }]));
  for (const vaccination of open) {
    const entry = found.get(vaccination.flockId)!;
    if (vaccination.plannedDate < todayOf.get(vaccination.flockId)!) entry.overdue++;
    else entry.next ??= vaccination;
  }
  return found;
}

/** `flocks` must be loaded with flockIncludes. */
export async function toFlockSummaries(flocks: Flock[], transaction?: Transaction): Promise<FlockSummary[]> {
  const open = await openVaccinations(flocks, transaction);
  return flocks.map((flock) => {
    const house = flock.house!;
    const site = house.site!;
    const today = siteToday(site);
    const { next: upcoming, overdue } = open.get(flock.id)!;
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
      overdueVaccinations: flock.depletedOn ? 0 : overdue,
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
  const vaccinations = await loadVaccinationViews({ flockId: id }, transaction);
  const today = siteToday(flock.house!.site!);
  return {
    ...summary!,
    today,
    houseCapacity: flock.house!.capacity ?? null,
    notes: flock.notes,
    birdCounts,
    vaccinations,
    schedule: flockSchedule({
      hatchDate: flock.hatchDate,
      placementDate: flock.placementDate,
      lastDay: depletionDateOf(flock),
      depleted: (flock.depletedOn ?? null) !== null,
      today,
      steps: await programmeSteps(flock.programmeId, transaction),
      vaccinations,
    }),
  };
}

async function programmeSteps(programmeId: number | null, transaction?: Transaction): Promise<ScheduleStep[]> {
  if (programmeId === null) return [];
  const steps = await ProgrammeStep.findAll({ where: { programmeId }, include: [{ model: Product, as: 'product', attributes: ['id', 'name'] }], transaction });
  return steps.map((step) => ({
    id: step.id,
    position: step.position,
    productId: step.productId,
    productName: step.product?.name ?? '',
    ageValue: step.ageValue,
    ageUnit: step.ageUnit,
    route: step.route,
  }));
}
