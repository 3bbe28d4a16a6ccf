// Readiness checks recorded with who and when, a veterinarian's override of a failed one, and the start they gate.
import { QueryTypes, type Transaction } from 'sequelize';
import { Vaccination } from '../../database/models/index.js';
import type { MemberCheckInput, VaccinationCheckInput } from '../../shared/vaccination-day/day-schemas.js';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import { readinessLabels } from '../../shared/vaccination-day/readiness-kinds.js';
import { evaluateCheck, type CheckAnswers, type CheckFacts } from '../../shared/vaccination-day/readiness-rules.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { crewFor, crewMemberIds, type Crew } from './crew-service.js';
import { loadRunView } from './run-view.js';
import { loadFacts, sitePlan } from './vaccination-facts.js';

async function requireCrew(context: AppContext, facts: { site: { id: number }; vaccination: Vaccination }, transaction?: Transaction): Promise<Crew> {
  if (facts.vaccination.status !== 'confirmed') throw AppError.conflict(`This vaccination is ${facts.vaccination.status}; only a confirmed vaccination is checked.`);
  const crew = await crewFor(context, facts.site.id, facts.vaccination.plannedDate, transaction);
  if (!crew) throw AppError.conflict('No crew is assigned to this site on this day: assign a crew lead first.');
  return crew;
}

/** Sites on the lead's sheet that day: visits to them do not break the 12-hour rule. */
async function sheetSiteIds(context: AppContext, leadId: number, day: string): Promise<number[]> {
  const rows = await context.sequelize.query<{ site_id: number }>('SELECT site_id FROM crew_assignments WHERE lead_id = :leadId AND day = :day', {
    replacements: { leadId, day },
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => r.site_id);
}

function answersOf(input: { answers: MemberCheckInput['answers'] }): CheckAnswers {
  const { visits, ...rest } = input.answers;
  return { ...rest, visits: visits?.map((v) => ({ siteId: v.siteId, at: Date.parse(v.at), label: v.label })) };
}

async function insertCheck(
  context: AppContext,
  row: { day: string; leadId: number; vaccinationId: number | null; memberId: number | null; kind: string; passed: boolean; details: object; note: string; recordedBy: number },
  transaction: Transaction,
): Promise<number> {
  const [rows] = (await context.sequelize.query(
    `INSERT INTO readiness_checks (day, lead_id, vaccination_id, member_id, check_kind, passed, details, note, recorded_by)
     VALUES (:day, :leadId, :vaccinationId, :memberId, :kind, :passed, :details, :note, :recordedBy) RETURNING id`,
    { replacements: { ...row, details: JSON.stringify(row.details) }, transaction },
  )) as [{ id: number }[], unknown];
  return rows[0]!.id;
}

export async function recordMemberCheck(context: AppContext, actorId: number, vaccinationId: number, input: MemberCheckInput): Promise<RunView> {
  const facts = await loadFacts(vaccinationId);
  const crew = await requireCrew(context, facts);
  if (input.day !== facts.vaccination.plannedDate) throw AppError.unprocessable('This vaccination is on another day.', [{ field: 'day', message: `The day is ${facts.vaccination.plannedDate}.` }]);
  if (!crewMemberIds(crew).includes(input.memberId)) throw AppError.unprocessable('That person is not on this crew.', [{ field: 'memberId', message: 'Not on the crew.' }]);
  const answers = answersOf(input);
  const checkFacts: CheckFacts = {
    firstVisitAt: input.firstVisitAt ? Date.parse(input.firstVisitAt) : Date.now(),
    sheetSiteIds: await sheetSiteIds(context, crew.leadId, input.day),
  };
  const outcome = evaluateCheck(input.kind, answers, checkFacts);
  await context.sequelize.transaction(async (transaction) => {
    const details = { message: outcome.message, answers: input.answers, firstVisitAt: input.firstVisitAt ?? null };
    const id = await insertCheck(context, { day: input.day, leadId: crew.leadId, vaccinationId: null, memberId: input.memberId, kind: input.kind, passed: outcome.passed, details, note: input.note, recordedBy: actorId }, transaction);
    await recordAudit({ actorId, action: 'readiness.check', entity: 'readiness_check', entityId: id, after: { ...input, passed: outcome.passed, message: outcome.message } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

export async function recordVaccinationCheck(context: AppContext, actorId: number, vaccinationId: number, input: VaccinationCheckInput): Promise<RunView> {
  const facts = await loadFacts(vaccinationId);
  const crew = await requireCrew(context, facts);
  const planned = input.kind === 'enough_vaccine' ? (await sitePlan(facts.site.id)).get(vaccinationId) : undefined;
  const outcome = evaluateCheck(input.kind, answersOf(input), {
    withdrawalBlocks: facts.withdrawal.blocksConfirmation,
    withdrawalDays: facts.withdrawal.withdrawalDays,
    daysBeforeDepletion: facts.withdrawal.daysBeforeDepletion,
    heatLimitF: facts.heatLimitF,
    // Doses the site's own fridges cannot cover today (orders and transfers not yet here do not count).
    shortfallDoses: planned ? planned.dosesNeeded - planned.allocations.filter((a) => a.source === 'stock').reduce((s, a) => s + a.doses, 0) : 0,
  });
  await context.sequelize.transaction(async (transaction) => {
    const details = { message: outcome.message, answers: input.answers };
    const id = await insertCheck(context, { day: facts.vaccination.plannedDate, leadId: crew.leadId, vaccinationId, memberId: null, kind: input.kind, passed: outcome.passed, details, note: input.note, recordedBy: actorId }, transaction);
    await recordAudit({ actorId, action: 'readiness.check', entity: 'readiness_check', entityId: id, after: { vaccinationId, ...input, passed: outcome.passed, message: outcome.message } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

/** A veterinarian lets one failed check go ahead; the check must belong to this vaccination or its crew's day. */
export async function overrideCheck(context: AppContext, veterinarianId: number, vaccinationId: number, checkId: number, reason: string): Promise<RunView> {
  const view = await loadRunView(context, vaccinationId);
  const check = view.checks.find((c) => c.id === checkId);
  if (!check) throw AppError.notFound('No such check on this vaccination.');
  if (check.passed) throw AppError.conflict('This check passed: there is nothing to override.');
  if (check.override) throw AppError.conflict('A veterinarian already overrode this check.');
  await context.sequelize.transaction(async (transaction) => {
    await context.sequelize.query('INSERT INTO readiness_overrides (readiness_check_id, reason, decided_by) VALUES (:checkId, :reason, :veterinarianId)', {
      replacements: { checkId, reason, veterinarianId },
      transaction,
    });
    await recordAudit({ actorId: veterinarianId, action: 'readiness.override', entity: 'readiness_check', entityId: checkId, before: check, after: { reason } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

/** The start: a confirmed vaccination on its day, every check passed or overridden. */
export async function startVaccination(context: AppContext, actorId: number, vaccinationId: number): Promise<RunView> {
  await context.sequelize.transaction(async (transaction) => {
    const vaccination = await Vaccination.findByPk(vaccinationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!vaccination) throw AppError.notFound('No such vaccination.');
    if (vaccination.status !== 'confirmed') throw AppError.conflict(`This vaccination is ${vaccination.status}; only a confirmed vaccination starts.`);
    const view = await loadRunView(context, vaccinationId, { transaction });
    if (!view.crew) throw AppError.conflict('No crew is assigned to this site on this day: assign a crew lead first.');
    if (view.startedAt) throw AppError.conflict('This vaccination has already started.');
    if (view.blockers.length) {
      const list = view.blockers.map((b) => `${readinessLabels[b.kind]} (${b.why})`).join('; ');
      throw AppError.conflict(`Not ready to start: ${list}. A failed check needs a veterinarian's override.`, [{ field: 'checks', message: list }]);
    }
    await context.sequelize.query('INSERT INTO vaccination_starts (vaccination_id, started_by) VALUES (:vaccinationId, :actorId)', { replacements: { vaccinationId, actorId }, transaction });
    await recordAudit({ actorId, action: 'vaccination.start', entity: 'vaccination', entityId: vaccinationId, after: { checks: view.checks.map((c) => c.id) } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}
