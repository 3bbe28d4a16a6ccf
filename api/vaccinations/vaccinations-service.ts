// Vaccinations: added or moved by hand, confirmed (never inside the withdrawal window without a veterinarian's override), cancelled.
import { Op, type Transaction } from 'sequelize';
import { Flock, House, Product, Site, Vaccination, WithdrawalOverride } from '../../database/models/index.js';
import type { VaccinationChange, VaccinationInput, VaccinationView } from '../../shared/flocks/vaccination-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { depletionDateOf, loadVaccinationView, loadVaccinationViews } from './vaccination-view.js';

export async function siteOfVaccination(id: number): Promise<number | null> {
  const row = await Vaccination.findByPk(id, {
    attributes: ['id'],
    include: [{ model: Flock, as: 'flock', attributes: ['id'], include: [{ model: House, as: 'house', attributes: ['siteId'] }] }],
  });
  return row?.flock?.house?.siteId ?? null;
}

export async function listVaccinations(user: Express.User, query: { siteId?: number; from?: string; to?: string }): Promise<VaccinationView[]> {
  const visible = (id: number) => user.allSites || user.siteIds.includes(id);
  const siteIds = query.siteId !== undefined ? [query.siteId].filter(visible) : user.allSites ? null : user.siteIds;
  const houses = await House.findAll({ where: siteIds ? { siteId: siteIds } : {}, attributes: ['id'] });
  const flocks = await Flock.findAll({ where: { houseId: houses.map((h) => h.id) }, attributes: ['id'] });
  const dates = { ...(query.from && { [Op.gte]: query.from }), ...(query.to && { [Op.lte]: query.to }) };
  return loadVaccinationViews({
    flockId: flocks.map((f) => f.id),
    status: ['planned', 'confirmed', 'done'],
    ...(query.from || query.to ? { plannedDate: dates } : {}),
  });
}

interface FlockContext {
  flock: Flock;
  today: string;
}

async function lockFlock(flockId: number, transaction: Transaction): Promise<FlockContext> {
  const flock = await Flock.findByPk(flockId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!flock) throw AppError.notFound('No such flock.');
  const house = await House.findByPk(flock.houseId, { include: [{ model: Site, as: 'site' }], transaction });
  return { flock, today: siteToday(house!.site!) };
}

/** A planned date must fall in the flock's life and ahead of today: the past is recorded on the vaccination day, not planned. */
function assertPlannedDate(date: string, { flock, today }: FlockContext): void {
  const fail = (message: string) => AppError.badRequest(message, [{ field: 'plannedDate', message }]);
  if (flock.depletedOn) throw AppError.conflict(`This flock was depleted on ${flock.depletedOn}.`);
  if (date < today) throw fail('Plan a vaccination for today or later.');
  if (date < flock.placementDate) throw fail(`The flock is placed on ${flock.placementDate}.`);
  const last = depletionDateOf(flock);
  if (last !== null && date >= last) throw fail(`The flock is depleted on ${last}; no vaccination on or after it.`);
}

export async function addVaccination(context: AppContext, actorId: number, flockId: number, input: VaccinationInput): Promise<VaccinationView> {
  return context.sequelize.transaction(async (transaction) => {
    const flock = await lockFlock(flockId, transaction);
    if (!(await Product.findByPk(input.productId, { transaction }))) throw AppError.badRequest('No such product.', [{ field: 'productId', message: 'Unknown product.' }]);
    assertPlannedDate(input.plannedDate, flock);
    const vaccination = await Vaccination.create({ ...input, flockId, programmeStepId: null, movedByHand: true, createdBy: actorId }, { transaction });
    const view = await loadVaccinationView(vaccination.id, transaction);
    await recordAudit({ actorId, action: 'vaccination.create', entity: 'vaccination', entityId: vaccination.id, after: view }, transaction);
    return view;
  });
}

async function lockOpenVaccination(id: number, transaction: Transaction): Promise<{ vaccination: Vaccination; flock: FlockContext }> {
  const found = await Vaccination.findByPk(id, { attributes: ['flockId'], transaction });
  if (!found) throw AppError.notFound('No such vaccination.');
  // Flock first, then vaccination: every writer takes the locks in this order.
  const flock = await lockFlock(found.flockId, transaction);
  const vaccination = (await Vaccination.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }))!;
  if (vaccination.status === 'done' || vaccination.status === 'cancelled') throw AppError.conflict(`This vaccination is ${vaccination.status}; it no longer changes.`);
  return { vaccination, flock };
}

export async function changeVaccination(context: AppContext, actorId: number, id: number, change: VaccinationChange): Promise<VaccinationView> {
  return context.sequelize.transaction(async (transaction) => {
    const { vaccination, flock } = await lockOpenVaccination(id, transaction);
    const before = await loadVaccinationView(id, transaction);
    const moved = change.plannedDate !== undefined && change.plannedDate !== vaccination.plannedDate;
    if (moved) assertPlannedDate(change.plannedDate!, flock);
    await vaccination.update(
      {
        ...(change.notes !== undefined && { notes: change.notes }),
        // A new date is a new plan: a confirmation given for the old one does not carry over.
        ...(moved && { plannedDate: change.plannedDate!, movedByHand: true, status: 'planned', confirmedBy: null, confirmedAt: null }),
      },
      { transaction },
    );
    const after = await loadVaccinationView(id, transaction);
    await recordAudit({ actorId, action: moved ? 'vaccination.move' : 'vaccination.update', entity: 'vaccination', entityId: id, before, after }, transaction);
    return after;
  });
}

export async function confirmVaccination(context: AppContext, actorId: number, id: number): Promise<VaccinationView> {
  return context.sequelize.transaction(async (transaction) => {
    const { vaccination, flock } = await lockOpenVaccination(id, transaction);
    if (vaccination.status !== 'planned') throw AppError.conflict('This vaccination is already confirmed.');
    // A confirmation promises the day to the crew; a day already gone cannot be promised, only planned again.
    if (vaccination.plannedDate < flock.today) {
      throw AppError.conflict(`Its day (${vaccination.plannedDate}) has passed: plan a new date first, or cancel it with a reason.`, [
        { field: 'plannedDate', message: 'Overdue: choose a new date.' },
      ]);
    }
    const before = await loadVaccinationView(id, transaction);
    const { withdrawal } = before;
    if (withdrawal.blocksConfirmation) {
      const message =
        `Planned ${withdrawal.daysBeforeDepletion} days before the flock's depletion, inside the label's ${withdrawal.withdrawalDays}-day withdrawal period: ` +
        'a veterinarian must override it with a reason before it can be confirmed.';
      throw AppError.conflict(message, [{ field: 'plannedDate', message: 'Inside the withdrawal period.' }]);
    }
    await vaccination.update({ status: 'confirmed', confirmedBy: actorId, confirmedAt: new Date() }, { transaction });
    const after = await loadVaccinationView(id, transaction);
    await recordAudit({ actorId, action: 'vaccination.confirm', entity: 'vaccination', entityId: id, before, after }, transaction);
    return after;
  });
}

export async function cancelVaccination(context: AppContext, actorId: number, id: number, reason: string): Promise<VaccinationView> {
  return context.sequelize.transaction(async (transaction) => {
    const { vaccination } = await lockOpenVaccination(id, transaction);
    const before = await loadVaccinationView(id, transaction);
    await vaccination.update({ status: 'cancelled', cancelledBy: actorId, cancelledAt: new Date(), cancelReason: reason }, { transaction });
    const after = await loadVaccinationView(id, transaction);
    await recordAudit({ actorId, action: 'vaccination.cancel', entity: 'vaccination', entityId: id, before, after }, transaction);
    return after;
  });
}

/** Only a veterinarian rules here; the override covers this date, this depletion and this label's withdrawal days. */
export async function overrideWithdrawal(context: AppContext, veterinarianId: number, id: number, reason: string): Promise<VaccinationView> {
  return context.sequelize.transaction(async (transaction) => {
    const { vaccination, flock } = await lockOpenVaccination(id, transaction);
    const before = await loadVaccinationView(id, transaction);
    if (!before.withdrawal.flagged) throw AppError.conflict('This vaccination is outside the withdrawal period: there is nothing to override.');
    if (before.withdrawal.overridden) throw AppError.conflict('An override already covers this date and depletion.');
    const override = await WithdrawalOverride.create(
      {
        vaccinationId: id,
        vaccinationDate: vaccination.plannedDate,
        depletionDate: depletionDateOf(flock.flock)!,
        withdrawalDays: before.withdrawal.withdrawalDays,
        reason,
        decidedBy: veterinarianId,
      },
      { transaction },
    );
    const after = await loadVaccinationView(id, transaction);
    await recordAudit(
      { actorId: veterinarianId, action: 'vaccination.withdrawal_override', entity: 'vaccination', entityId: id, before, after: { ...after, override: override.get({ plain: true }) } },
      transaction,
    );
    return after;
  });
}
