// Turns stored excursions, gaps and fills into the shapes the fridge page and the review read.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { BackupFillView, ExcursionView, FridgeEvents, GapView } from '../../shared/fridges/excursion-view.js';
import { Excursion } from '../../database/models/index.js';

export function toExcursionView(row: Excursion, sourceImportIds: number[] = []): ExcursionView {
  return {
    id: row.id,
    fridgeId: row.fridgeId,
    source: row.source,
    kind: row.kind,
    start: row.startsAt.toISOString(),
    end: row.endsAt.toISOString(),
    minutes: row.minutes,
    peakC: row.peakC,
    degreeMinutesC: row.degreeMinutesC,
    openEnded: row.openEnded,
    backupMinutes: row.backupMinutes,
    lowC: row.lowC,
    highC: row.highC,
    status: row.status,
    followUpOfId: row.followUpOfId,
    dailyCheckId: row.dailyCheckId,
    actionTaken: row.actionTaken,
    sourceImportIds,
  };
}

export async function excursionViews(sequelize: Sequelize, rows: Excursion[]): Promise<ExcursionView[]> {
  if (!rows.length) return [];
  const links = await sequelize.query<{ excursion_id: number; log_import_id: number }>(
    'SELECT excursion_id, log_import_id FROM excursion_imports WHERE excursion_id IN (:ids) ORDER BY log_import_id',
    { replacements: { ids: rows.map((r) => r.id) }, type: QueryTypes.SELECT },
  );
  return rows.map((row) => toExcursionView(row, links.filter((l) => l.excursion_id === row.id).map((l) => l.log_import_id)));
}

interface SpanRow {
  starts_at: Date;
  ends_at: Date;
  minutes: number;
}

const toSpan = (row: SpanRow): GapView => ({ start: new Date(row.starts_at).toISOString(), end: new Date(row.ends_at).toISOString(), minutes: row.minutes });

/** A fridge's excursions, gaps and backup fills, newest first; `from`/`to` limit them to those meeting the range. */
export async function fridgeEvents(sequelize: Sequelize, fridgeId: number, range: { from?: Date; to?: Date } = {}): Promise<FridgeEvents> {
  const replacements = { fridgeId, from: (range.from ?? new Date(0)).toISOString(), to: (range.to ?? new Date('9999-01-01')).toISOString() };
  const where = 'fridge_id = :fridgeId AND ends_at >= :from AND starts_at <= :to';
  const rows = await Excursion.sequelize!.query<{ id: number }>(`SELECT id FROM excursions WHERE ${where} ORDER BY starts_at DESC, id DESC LIMIT 1000`, { replacements, type: QueryTypes.SELECT });
  const excursions = rows.length ? await Excursion.findAll({ where: { id: rows.map((r) => r.id) }, order: [['startsAt', 'DESC'], ['id', 'DESC']] }) : [];
  const gaps = await sequelize.query<SpanRow>(`SELECT starts_at, ends_at, minutes FROM fridge_gaps WHERE ${where} ORDER BY starts_at DESC LIMIT 1000`, { replacements, type: QueryTypes.SELECT });
  const fills = await sequelize.query<SpanRow & { logger_id: number }>(
    `SELECT f.starts_at, f.ends_at, f.minutes, coalesce((SELECT l.id FROM loggers l WHERE l.fridge_id = f.fridge_id AND l.role = 'backup' ORDER BY l.removed_on DESC NULLS FIRST LIMIT 1), 0) AS logger_id
     FROM backup_fills f WHERE f.fridge_id = :fridgeId AND f.ends_at >= :from AND f.starts_at <= :to ORDER BY f.starts_at DESC LIMIT 1000`,
    { replacements, type: QueryTypes.SELECT },
  );
  return {
    excursions: await excursionViews(sequelize, excursions),
    gaps: gaps.map(toSpan),
    fills: fills.map((row): BackupFillView => ({ ...toSpan(row), loggerId: row.logger_id })),
  };
}
