// What has happened on one vaccination so far: checks (with overrides), the trial, the start, mixings, vials out and back, the record.
import { QueryTypes, type Transaction } from 'sequelize';
import type { AppContext } from '../app-context.js';
import type { ReadinessKind } from '../../shared/vaccination-day/readiness-kinds.js';
import type { CheckView, LotOut, RunView } from '../../shared/vaccination-day/day-views.js';

interface CheckRow {
  id: number;
  check_kind: ReadinessKind;
  member_id: number | null;
  member_name: string | null;
  passed: boolean;
  details: { message?: string };
  note: string;
  recorder: string;
  recorded_at: Date;
  reason: string | null;
  decider: string | null;
  decided_at: Date | null;
}

/** The vaccination's own checks and its crew's member checks for that lead and day, oldest first. */
export async function loadChecks(context: AppContext, vaccinationId: number, crew: { leadId: number; day: string } | null, transaction?: Transaction): Promise<CheckView[]> {
  const rows = await context.sequelize.query<CheckRow>(
    `SELECT c.id, c.check_kind, c.member_id, m.name AS member_name, c.passed, c.details, c.note, r.name AS recorder, c.recorded_at,
            o.reason, d.name AS decider, o.decided_at
     FROM readiness_checks c JOIN users r ON r.id = c.recorded_by LEFT JOIN users m ON m.id = c.member_id
       LEFT JOIN readiness_overrides o ON o.readiness_check_id = c.id LEFT JOIN users d ON d.id = o.decided_by
     WHERE c.vaccination_id = :vaccinationId OR (c.member_id IS NOT NULL AND c.lead_id = :leadId AND c.day = :day)
     ORDER BY c.recorded_at, c.id`,
    { replacements: { vaccinationId, leadId: crew?.leadId ?? 0, day: crew?.day ?? '1970-01-01' }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    id: r.id,
    kind: r.check_kind,
    memberId: r.member_id,
    memberName: r.member_name,
    passed: r.passed,
    message: r.details.message ?? '',
    note: r.note,
    recordedBy: r.recorder,
    recordedAt: r.recorded_at.toISOString(),
    override: r.reason === null ? null : { reason: r.reason, decidedBy: r.decider ?? '', decidedAt: r.decided_at!.toISOString() },
  }));
}

export async function loadLotsOut(context: AppContext, vaccinationId: number, transaction?: Transaction): Promise<LotOut[]> {
  const rows = await context.sequelize.query<{ lot_id: number; lot_number: string; doses_per_vial: number; issued: string; returned: string; left_at: Date; from_fridge_id: number }>(
    `SELECT m.lot_id, l.lot_number, p.doses_per_vial,
            sum(m.vials) FILTER (WHERE m.kind = 'issue') AS issued,
            coalesce(sum(m.vials) FILTER (WHERE m.kind = 'return'), 0) AS returned,
            min(m.left_at) FILTER (WHERE m.kind = 'issue') AS left_at,
            (array_agg(m.from_fridge_id ORDER BY m.at, m.id) FILTER (WHERE m.kind = 'issue'))[1] AS from_fridge_id
     FROM stock_movements m JOIN lots l ON l.id = m.lot_id JOIN presentations p ON p.id = l.presentation_id
     WHERE m.source_kind = 'vaccination' AND m.source_id = :vaccinationId AND m.kind IN ('issue', 'return')
     GROUP BY m.lot_id, l.lot_number, p.doses_per_vial
     HAVING sum(m.vials) FILTER (WHERE m.kind = 'issue') > 0
     ORDER BY min(m.at), m.lot_id`,
    { replacements: { vaccinationId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    lotId: r.lot_id,
    lotNumber: r.lot_number,
    dosesPerVial: r.doses_per_vial,
    issued: Number(r.issued),
    returned: Number(r.returned),
    out: Number(r.issued) - Number(r.returned),
    leftAt: r.left_at.toISOString(),
    fromFridgeId: r.from_fridge_id,
  }));
}

export async function loadProgress(context: AppContext, vaccinationId: number, transaction?: Transaction): Promise<Pick<RunView, 'trial' | 'startedAt' | 'mixedAt' | 'record'>> {
  const q = <T extends object>(sql: string) => context.sequelize.query<T>(sql, { replacements: { vaccinationId }, type: QueryTypes.SELECT, transaction });
  const [trial] = await q<{ result: string; nozzle_height_cm: string; walking_pace_m_per_min: string; notes: string; recorded_at: Date; photo_ids: number[] }>(
    `SELECT t.*, coalesce((SELECT array_agg(p.id ORDER BY p.id) FROM sprayer_trial_photos p WHERE p.trial_id = t.id), '{}') AS photo_ids
     FROM sprayer_trials t WHERE t.vaccination_id = :vaccinationId ORDER BY t.recorded_at DESC, t.id DESC LIMIT 1`,
  );
  const [start] = await q<{ started_at: Date }>('SELECT started_at FROM vaccination_starts WHERE vaccination_id = :vaccinationId');
  const [mixing] = await q<{ mixed_at: Date }>('SELECT mixed_at FROM vaccination_mixings WHERE vaccination_id = :vaccinationId ORDER BY mixed_at DESC, id DESC LIMIT 1');
  const [record] = await q<{ id: number; signer_name: string; signed_at: Date; birds_vaccinated: number }>(
    'SELECT id, signer_name, signed_at, birds_vaccinated FROM vaccination_records WHERE vaccination_id = :vaccinationId',
  );
  return {
    trial: trial
      ? { result: trial.result, nozzleHeightCm: Number(trial.nozzle_height_cm), walkingPaceMPerMin: Number(trial.walking_pace_m_per_min), notes: trial.notes, recordedAt: trial.recorded_at.toISOString(), photoIds: trial.photo_ids }
      : null,
    startedAt: start?.started_at.toISOString() ?? null,
    mixedAt: mixing?.mixed_at.toISOString() ?? null,
    record: record ? { id: record.id, signerName: record.signer_name, signedAt: record.signed_at.toISOString(), birdsVaccinated: record.birds_vaccinated } : null,
  };
}
