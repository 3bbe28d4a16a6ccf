// Programmes: listed for everyone working with flocks; saved with their steps, after which every flock following one is brought in line.
import { Op, type Transaction } from 'sequelize';
import { Flock, Product, Programme, ProgrammeStep, Vaccination } from '../../database/models/index.js';
import type { ProgrammeInput, ProgrammeView } from '../../shared/flocks/programme-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { withConstraintConflicts } from '../flocks/constraint-conflict.js';
import { reconcileFlock } from '../flocks/reconcile-flock.js';
import { AppError } from '../http/app-error.js';
import { programmeIncludes, toProgrammeViews } from './programme-view.js';

export async function listProgrammes(): Promise<ProgrammeView[]> {
  return toProgrammeViews(await Programme.findAll({ include: programmeIncludes, order: [['name', 'ASC'], ['id', 'ASC']] }));
}

export async function getProgramme(id: number, transaction?: Transaction): Promise<ProgrammeView> {
  const programme = await Programme.findByPk(id, { include: programmeIncludes, transaction });
  if (!programme) throw AppError.notFound('No such programme.');
  const [view] = await toProgrammeViews([programme], transaction);
  return view!;
}

async function assertInput(input: ProgrammeInput, id: number | null, transaction: Transaction): Promise<void> {
  const clash = await Programme.findOne({ where: { name: { [Op.iLike]: input.name } }, transaction });
  if (clash && clash.id !== id) throw AppError.conflict('Another programme has this name.', [{ field: 'name', message: 'Already in use.' }]);
  const productIds = [...new Set(input.steps.map((step) => step.productId))];
  const known = new Set((await Product.findAll({ where: { id: productIds }, attributes: ['id'], transaction })).map((p) => p.id));
  const unknown = input.steps.findIndex((step) => !known.has(step.productId));
  if (unknown >= 0) throw AppError.badRequest('No such product.', [{ field: `steps.${unknown}.productId`, message: 'Unknown product.' }]);
}

/**
 * Steps keep their ids when edited, so vaccinations generated from them stay linked; steps left out are removed,
 * and with them the vaccinations they generated that nobody confirmed or moved. Returns those removed.
 */
async function writeSteps(programmeId: number, input: ProgrammeInput, transaction: Transaction): Promise<unknown[]> {
  const existing = await ProgrammeStep.findAll({ where: { programmeId }, transaction });
  const ownIds = new Set(existing.map((step) => step.id));
  const foreign = input.steps.findIndex((step) => step.id !== undefined && !ownIds.has(step.id));
  if (foreign >= 0) throw AppError.badRequest('That step is not part of this programme.', [{ field: `steps.${foreign}.id`, message: 'Unknown step.' }]);
  const kept = new Set(input.steps.flatMap((step) => (step.id === undefined ? [] : [step.id])));
  const dropped = existing.filter((step) => !kept.has(step.id)).map((step) => step.id);
  const untouched = { programmeStepId: dropped, status: 'planned' as const, movedByHand: false };
  const removed = dropped.length ? await Vaccination.findAll({ where: untouched, transaction }) : [];
  if (removed.length) await Vaccination.destroy({ where: { id: removed.map((v) => v.id) }, transaction });
  if (dropped.length) await ProgrammeStep.destroy({ where: { id: dropped }, transaction });
  for (const [index, step] of input.steps.entries()) {
    const fields = { programmeId, position: index + 1, productId: step.productId, ageValue: step.ageValue, ageUnit: step.ageUnit, route: step.route, notes: step.notes };
    if (step.id === undefined) await ProgrammeStep.create(fields, { transaction });
    else await ProgrammeStep.update(fields, { where: { id: step.id }, transaction });
  }
  return removed.map((v) => v.get({ plain: true }));
}

const nameConflict = { programmes_name_idx: { field: 'name', message: 'Another programme has this name.' } };

export async function saveProgramme(context: AppContext, actorId: number, id: number | null, input: ProgrammeInput): Promise<ProgrammeView> {
  return context.sequelize.transaction(async (transaction) => {
    await assertInput(input, id, transaction);
    const { steps: _steps, ...fields } = input;
    let programme: Programme;
    let before: ProgrammeView | null = null;
    if (id === null) {
      programme = await withConstraintConflicts(() => Programme.create({ ...fields, createdBy: actorId }, { transaction }), nameConflict);
    } else {
      const found = await Programme.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!found) throw AppError.notFound('No such programme.');
      programme = found;
      before = await getProgramme(id, transaction);
      await withConstraintConflicts(() => programme.update(fields, { transaction }), nameConflict);
    }
    const vaccinationsRemoved = await writeSteps(programme.id, input, transaction);
    const after = await getProgramme(programme.id, transaction);
    const action = id === null ? 'programme.create' : 'programme.update';
    await recordAudit({ actorId, action, entity: 'programme', entityId: programme.id, before, after: { ...after, vaccinationsRemoved } }, transaction);
    if (id !== null) {
      const flocks = await Flock.findAll({ where: { programmeId: id, depletedOn: null }, attributes: ['id'], transaction });
      for (const flock of flocks) await reconcileFlock(flock.id, actorId, transaction);
    }
    return after;
  });
}
