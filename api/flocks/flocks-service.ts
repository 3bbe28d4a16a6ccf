// Flocks: listed per visible site, placed in a house, changed, given a programme (which generates vaccinations), depleted.
import { Op, type Transaction } from 'sequelize';
import { BirdCount, Flock, House, Programme, Site, Vaccination } from '../../database/models/index.js';
import { firstNegativeEntry } from '../../shared/flocks/current-birds.js';
import type { FlockInput, FlockSummary, FlockView } from '../../shared/flocks/flock-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { withConstraintConflicts } from './constraint-conflict.js';
import { flockIncludes, loadFlockView, toFlockSummaries } from './flock-view.js';
import { reconcileFlock } from './reconcile-flock.js';
import { siteToday } from './site-today.js';

export async function siteOfFlock(id: number): Promise<number | null> {
  const flock = await Flock.findByPk(id, { attributes: ['id'], include: [{ model: House, as: 'house', attributes: ['siteId'] }] });
  return flock?.house?.siteId ?? null;
}

export async function listFlocks(user: Express.User, query: { siteId?: number; includeDepleted: 'true' | 'false' }): Promise<FlockSummary[]> {
  const siteIds = query.siteId !== undefined ? [query.siteId] : null;
  const visible = (id: number) => user.allSites || user.siteIds.includes(id);
  const houseWhere = siteIds ? { siteId: siteIds.filter(visible) } : user.allSites ? {} : { siteId: user.siteIds };
  const flocks = await Flock.findAll({
    where: query.includeDepleted === 'true' ? {} : { depletedOn: null },
    include: flockIncludes.map((include) => (include.as === 'house' ? { ...include, where: houseWhere, required: true } : include)),
    order: [['placementDate', 'DESC'], ['id', 'DESC']],
    limit: 500,
  });
  return toFlockSummaries(flocks);
}

export { loadFlockView as getFlock };

const stayConflicts = {
  flocks_house_stay_excl: { field: 'placementDate', message: 'The house holds another flock at that time: flocks in one house may not overlap.' },
  flocks_house_name_idx: { field: 'name', message: 'Another flock in this house has this name.' },
};

async function assertProgramme(programmeId: number | null, previous: number | null, transaction: Transaction): Promise<void> {
  if (programmeId === null || programmeId === previous) return;
  const programme = await Programme.findByPk(programmeId, { transaction });
  if (!programme) throw AppError.badRequest('No such programme.', [{ field: 'programmeId', message: 'Unknown programme.' }]);
  if (!programme.active) throw AppError.conflict('This programme is retired.', [{ field: 'programmeId', message: 'Retired: choose a programme in use.' }]);
}

async function assertNameFree(houseId: number, name: string, exceptId: number | null, transaction: Transaction): Promise<void> {
  const clash = await Flock.findOne({ where: { houseId, name: { [Op.iLike]: name } }, transaction });
  if (clash && clash.id !== exceptId) throw AppError.conflict('Another flock in this house has this name.', [{ field: 'name', message: 'Already used in this house.' }]);
}

export async function createFlock(context: AppContext, actorId: number, houseId: number, input: FlockInput): Promise<FlockView> {
  return context.sequelize.transaction(async (transaction) => {
    // The house row lock queues concurrent placements into one house, so the overlap check below sees the other.
    const house = await House.findByPk(houseId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!house) throw AppError.notFound('No such house.');
    if (!house.active) throw AppError.conflict('This house is out of use.', [{ field: 'houseId', message: 'Out of use: choose another house.' }]);
    await assertProgramme(input.programmeId, null, transaction);
    await assertNameFree(houseId, input.name, null, transaction);
    const flock = await withConstraintConflicts(() => Flock.create({ ...input, houseId, createdBy: actorId }, { transaction }), stayConflicts);
    await recordAudit({ actorId, action: 'flock.create', entity: 'flock', entityId: flock.id, after: flock.get({ plain: true }) }, transaction);
    await reconcileFlock(flock.id, actorId, transaction);
    return loadFlockView(flock.id, transaction);
  });
}

async function lockOpenFlock(id: number, transaction: Transaction): Promise<Flock> {
  const flock = await Flock.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!flock) throw AppError.notFound('No such flock.');
  if (flock.depletedOn) throw AppError.conflict(`This flock was depleted on ${flock.depletedOn}; its record no longer changes.`);
  return flock;
}

export async function updateFlock(context: AppContext, actorId: number, id: number, input: FlockInput): Promise<FlockView> {
  return context.sequelize.transaction(async (transaction) => {
    const flock = await lockOpenFlock(id, transaction);
    await assertProgramme(input.programmeId, flock.programmeId, transaction);
    await assertNameFree(flock.houseId, input.name, id, transaction);
    const counts = (await BirdCount.findAll({ where: { flockId: id }, transaction })).map((count) => count.get({ plain: true }));
    const early = counts.find((count) => count.countedOn < input.placementDate);
    if (early) throw AppError.conflict('A bird count comes before this placement date.', [{ field: 'placementDate', message: `A count is recorded on ${early.countedOn}.` }]);
    const negative = firstNegativeEntry(input.birdsPlaced, counts);
    if (negative) {
      throw AppError.conflict('The recorded losses would leave fewer than zero birds.', [{ field: 'birdsPlaced', message: `Too few for the losses recorded up to ${negative.countedOn}.` }]);
    }
    const before = flock.get({ plain: true });
    await withConstraintConflicts(() => flock.update(input, { transaction }), stayConflicts);
    await recordAudit({ actorId, action: 'flock.update', entity: 'flock', entityId: id, before, after: flock.get({ plain: true }) }, transaction);
    await reconcileFlock(id, actorId, transaction);
    return loadFlockView(id, transaction);
  });
}

/** The flock left the house: open vaccinations from that day on are cancelled with it. */
export async function depleteFlock(context: AppContext, actorId: number, id: number, depletedOn: string): Promise<FlockView> {
  return context.sequelize.transaction(async (transaction) => {
    const flock = await lockOpenFlock(id, transaction);
    const house = await House.findByPk(flock.houseId, { include: [{ model: Site, as: 'site' }], transaction });
    const today = siteToday(house!.site!);
    // A flock that never came in has no birds to take out: its dates are changed with the flock instead.
    if (flock.placementDate > today) {
      throw AppError.conflict(`This flock is not placed yet: it is placed on ${flock.placementDate}.`, [{ field: 'depletedOn', message: `Not placed until ${flock.placementDate}.` }]);
    }
    if (depletedOn < flock.placementDate) throw AppError.badRequest('Depletion cannot come before placement.', [{ field: 'depletedOn', message: `Placed on ${flock.placementDate}.` }]);
    if (depletedOn > today) throw AppError.badRequest('Record a depletion on or after the day it happens.', [{ field: 'depletedOn', message: 'Not in the future.' }]);
    const before = flock.get({ plain: true });
    await withConstraintConflicts(() => flock.update({ depletedOn }, { transaction }), stayConflicts);
    const [cancelled] = await Vaccination.update(
      { status: 'cancelled', cancelledBy: actorId, cancelledAt: new Date(), cancelReason: `Flock depleted on ${depletedOn}.` },
      { where: { flockId: id, status: ['planned', 'confirmed'], plannedDate: { [Op.gte]: depletedOn } }, transaction },
    );
    await recordAudit({ actorId, action: 'flock.deplete', entity: 'flock', entityId: id, before, after: { ...flock.get({ plain: true }), vaccinationsCancelled: cancelled } }, transaction);
    return loadFlockView(id, transaction);
  });
}
