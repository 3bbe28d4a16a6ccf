// The sprayer trial (spray only), each mixing, and the record of what was given: reconciled per lot and signed by the crew lead.
import { QueryTypes } from 'sequelize';
import { User, Vaccination } from '../../database/models/index.js';
import type { RecordInput, SprayerTrialInput } from '../../shared/vaccination-day/day-schemas.js';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import { noSprayerText, usesSprayer } from '../../shared/vaccination-day/sprayer.js';
import { reconcileVials } from '../../shared/vaccination-day/vial-returns.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { loadRunView } from './run-view.js';

export const recordSignatureMeaning = 'I led this vaccination and this record is true and complete.';

export async function recordTrial(context: AppContext, actorId: number, vaccinationId: number, input: SprayerTrialInput): Promise<RunView> {
  await context.sequelize.transaction(async (transaction) => {
    const vaccination = await Vaccination.findByPk(vaccinationId, { transaction });
    if (!vaccination) throw AppError.notFound('No such vaccination.');
    if (vaccination.status !== 'confirmed') throw AppError.conflict(`This vaccination is ${vaccination.status}.`);
    if (!usesSprayer(vaccination.route)) throw AppError.conflict(noSprayerText(vaccination.route), [{ field: 'trial', message: 'No sprayer to try.' }]);
    await context.sequelize.query(
      `INSERT INTO sprayer_trials (vaccination_id, result, nozzle_height_cm, walking_pace_m_per_min, notes, recorded_by)
       VALUES (:vaccinationId, :result, :nozzleHeightCm, :walkingPaceMPerMin, :notes, :actorId)`,
      { replacements: { vaccinationId, ...input, actorId }, transaction },
    );
    await recordAudit({ actorId, action: 'vaccination.sprayer_trial', entity: 'vaccination', entityId: vaccinationId, after: input }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

export async function recordMixing(context: AppContext, actorId: number, vaccinationId: number): Promise<RunView> {
  const view = await loadRunView(context, vaccinationId);
  if (view.status !== 'confirmed' || !view.startedAt) throw AppError.conflict('Start the vaccination before mixing.');
  if (!view.lotsOut.some((l) => l.out > 0)) throw AppError.conflict('Take the vials out of the fridge before mixing.');
  await context.sequelize.transaction(async (transaction) => {
    await context.sequelize.query('INSERT INTO vaccination_mixings (vaccination_id, recorded_by) VALUES (:vaccinationId, :actorId)', { replacements: { vaccinationId, actorId }, transaction });
    await recordAudit({ actorId, action: 'vaccination.mix', entity: 'vaccination', entityId: vaccinationId }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

/** Signs the record: password re-entered, issued = used + returned for every lot, then the vaccination is done. */
export async function signRecord(context: AppContext, signerId: number, vaccinationId: number, input: RecordInput): Promise<RunView> {
  const signer = await User.findByPk(signerId);
  if (!signer || !(await context.hasher.verify(input.password, signer.passwordHash))) {
    throw AppError.badRequest('The password is not right, so the record was not signed.', [{ field: 'password', message: 'Not right.' }]);
  }
  await context.sequelize.transaction(async (transaction) => {
    // Exclusive: waits for issues and returns in flight, and none starts until the record is in.
    const vaccination = await Vaccination.findByPk(vaccinationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!vaccination) throw AppError.notFound('No such vaccination.');
    if (vaccination.status !== 'confirmed') throw AppError.conflict(`This vaccination is ${vaccination.status}; it has no record to sign.`);
    const view = await loadRunView(context, vaccinationId, { transaction, plan: new Map() });
    if (!view.crew || view.crew.leadId !== signerId) throw AppError.forbidden('Only the crew lead of this day signs the record.');
    if (!view.startedAt) throw AppError.conflict('This vaccination never started.');
    // The trial and the cleaning are the sprayer's: asked of a spray vaccination, never of one by water, eye drop or the like.
    const sprayed = usesSprayer(vaccination.route);
    if (sprayed && !view.trial) throw AppError.conflict('Record the sprayer trial first.', [{ field: 'trial', message: 'No trial recorded.' }]);
    if (sprayed && !input.cleaning) throw AppError.unprocessable('Say which of the sprayer cleaning steps were done.', [{ field: 'cleaning', message: 'Tick the steps done.' }]);
    const cleaning = sprayed ? input.cleaning! : {};
    const endedAt = input.endedAt ? new Date(input.endedAt) : new Date();
    if (endedAt < new Date(view.startedAt)) throw AppError.unprocessable('The end is before the start.', [{ field: 'endedAt', message: 'Before the start.' }]);
    input.lots.forEach((entry, i) => {
      if (!view.lotsOut.some((l) => l.lotId === entry.lotId)) throw AppError.unprocessable('That lot was not issued for this vaccination.', [{ field: `lots.${i}.lotId`, message: 'Not issued here.' }]);
    });
    const lines = view.lotsOut.map((lot) => {
      const index = input.lots.findIndex((l) => l.lotId === lot.lotId);
      const used = index < 0 ? 0 : input.lots[index]!.vialsUsed;
      const balance = reconcileVials(lot.issued, used, lot.returned);
      if (!balance.balanced) {
        const message = `Lot ${lot.lotNumber}: ${lot.issued} issued, ${used} used and ${lot.returned} returned do not add up (${balance.difference > 0 ? `${balance.difference} unaccounted for` : `${-balance.difference} too many`}).`;
        throw AppError.conflict(message, [{ field: index < 0 ? 'lots' : `lots.${index}.vialsUsed`, message }]);
      }
      return { ...lot, used, doses: used * lot.dosesPerVial };
    });
    const dosesUsed = lines.reduce((sum, l) => sum + l.doses, 0);
    if (input.birdsVaccinated > dosesUsed) {
      throw AppError.unprocessable(`${input.birdsVaccinated} birds but only ${dosesUsed} doses used.`, [{ field: 'birdsVaccinated', message: `At most ${dosesUsed}.` }]);
    }
    const crew = [{ id: view.crew.leadId, name: view.crew.leadName, lead: true }, ...view.crew.members.map((m) => ({ ...m, lead: false }))];
    const [rows] = (await context.sequelize.query(
      `INSERT INTO vaccination_records (vaccination_id, started_at, ended_at, birds_vaccinated, crew, deviations, cleaning, signed_by, signer_name, signature_meaning)
       VALUES (:vaccinationId, :startedAt, :endedAt, :birds, :crew, :deviations, :cleaning, :signerId, :signerName, :meaning) RETURNING id`,
      {
        replacements: {
          vaccinationId, startedAt: view.startedAt, endedAt, birds: input.birdsVaccinated, crew: JSON.stringify(crew), deviations: input.deviations,
          cleaning: JSON.stringify(cleaning), signerId, signerName: signer.name, meaning: recordSignatureMeaning,
        },
        transaction,
      },
    )) as [{ id: number }[], unknown];
    const recordId = rows[0]!.id;
    for (const line of lines) {
      await context.sequelize.query(
        `INSERT INTO vaccination_record_lots (record_id, lot_id, vials_issued, vials_used, vials_returned, doses_used) VALUES (:recordId, :lotId, :issued, :used, :returned, :doses)`,
        { replacements: { recordId, lotId: line.lotId, issued: line.issued, used: line.used, returned: line.returned, doses: line.doses }, type: QueryTypes.INSERT, transaction },
      );
    }
    await vaccination.update({ status: 'done' }, { transaction });
    await recordAudit({ actorId: signerId, action: 'vaccination.record', entity: 'vaccination', entityId: vaccinationId, before: { status: 'confirmed' }, after: { recordId, birds: input.birdsVaccinated, lines, cleaning, deviations: input.deviations } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}
