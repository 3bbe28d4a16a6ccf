// Applies the programme reconciliation to a flock's stored vaccinations, inside the caller's transaction, with one audit entry.
import type { Transaction } from 'sequelize';
import { Flock, House, ProgrammeStep, Site, Vaccination } from '../../database/models/index.js';
import { reconcileProgramme, type ReconcileChanges } from '../../shared/flocks/reconcile-programme.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from './site-today.js';

export async function reconcileFlock(flockId: number, actorId: number, transaction: Transaction): Promise<ReconcileChanges> {
  const flock = await Flock.findByPk(flockId, { include: [{ model: House, as: 'house', include: [{ model: Site, as: 'site' }] }], transaction });
  if (!flock) throw new Error(`flock ${flockId} vanished`);
  const steps = flock.programmeId === null ? [] : await ProgrammeStep.findAll({ where: { programmeId: flock.programmeId }, transaction });
  const existing = await Vaccination.findAll({ where: { flockId }, transaction });
  const changes = reconcileProgramme({
    hatchDate: flock.hatchDate,
    placementDate: flock.placementDate,
    lastDay: flock.depletedOn ?? flock.plannedDepletionDate,
    today: siteToday(flock.house!.site!),
    steps,
    existing: existing.map((v) => ({ id: v.id, stepId: v.programmeStepId, productId: v.productId, route: v.route, plannedDate: v.plannedDate, status: v.status, movedByHand: v.movedByHand })),
  });
  if (!changes.create.length && !changes.update.length && !changes.remove.length) return changes;

  const removed = existing.filter((v) => changes.remove.includes(v.id)).map((v) => v.get({ plain: true }));
  if (changes.remove.length) await Vaccination.destroy({ where: { id: changes.remove }, transaction });
  for (const update of changes.update) {
    await Vaccination.update({ plannedDate: update.plannedDate, productId: update.productId, route: update.route }, { where: { id: update.id }, transaction });
  }
  const created = await Vaccination.bulkCreate(
    changes.create.map((c) => ({ flockId, programmeStepId: c.stepId, productId: c.productId, route: c.route, plannedDate: c.plannedDate, notes: c.notes, createdBy: actorId })),
    { transaction },
  );
  await recordAudit(
    {
      actorId,
      action: 'flock.vaccinations_generated',
      entity: 'flock',
      entityId: flockId,
      before: { removed },
      // Steps whose day had already passed are generated overdue: the entry says which, for whoever reads why they appeared.
      after: { created: created.map((v) => v.get({ plain: true })), overdueStepIds: changes.create.filter((c) => c.overdue).map((c) => c.stepId), updated: changes.update },
    },
    transaction,
  );
  return changes;
}
