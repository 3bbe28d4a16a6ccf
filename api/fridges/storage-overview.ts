// The storage home card: fridges not checked today, open excursions, fridges with no recent data, calibrations due.
import { QueryTypes, type Sequelize } from 'sequelize';
import { calibrationStatus } from '../../shared/fridges/calibration-status.js';
import type { FridgeStatus } from '../../shared/fridges/fridge-schemas.js';
import { siteDate } from '../../shared/fridges/site-date.js';
import { fridgeStatuses } from './fridge-statuses.js';

export interface StorageOverview {
  fridges: FridgeStatus[];
  openExcursions: { id: number; fridgeId: number; fridgeCode: string; kind: 'high' | 'low'; start: string; peakC: number; status: string; source: string }[];
  calibrations: { loggerId: number; serial: string; fridgeId: number; fridgeCode: string; dueOn: string | null; status: 'due-soon' | 'overdue' | 'none' }[];
}

export async function storageOverview(sequelize: Sequelize, siteIds: number[] | undefined, now = new Date()): Promise<StorageOverview> {
  const fridges = await fridgeStatuses(sequelize, siteIds, now);
  const ids = fridges.map((f) => f.id);
  if (!ids.length) return { fridges, openExcursions: [], calibrations: [] };
  const open = await sequelize.query<{ id: number; fridge_id: number; code: string; kind: 'high' | 'low'; starts_at: Date; peak_c: number; status: string; source: string }>(
    `SELECT e.id, e.fridge_id, f.code, e.kind, e.starts_at, e.peak_c, e.status, e.source FROM excursions e JOIN fridges f ON f.id = e.fridge_id
     WHERE e.fridge_id IN (:ids) AND e.status <> 'decided' ORDER BY e.starts_at DESC LIMIT 50`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const loggers = await sequelize.query<{ id: number; serial: string; fridge_id: number; code: string; due_on: string | null; time_zone: string }>(
    `SELECT l.id, l.serial, l.fridge_id, f.code, (SELECT max(c.due_on)::text FROM logger_certificates c WHERE c.logger_id = l.id) AS due_on, s.time_zone
     FROM loggers l JOIN fridges f ON f.id = l.fridge_id JOIN sites s ON s.id = f.site_id
     WHERE l.fridge_id IN (:ids) AND l.removed_on IS NULL ORDER BY f.code, l.serial`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const calibrations = loggers
    .map((l) => ({ loggerId: l.id, serial: l.serial, fridgeId: l.fridge_id, fridgeCode: l.code, dueOn: l.due_on, status: calibrationStatus(l.due_on, siteDate(now.getTime(), l.time_zone)) }))
    .filter((l): l is StorageOverview['calibrations'][number] => l.status !== 'ok');
  return {
    fridges,
    openExcursions: open.map((e) => ({ id: e.id, fridgeId: e.fridge_id, fridgeCode: e.code, kind: e.kind, start: new Date(e.starts_at).toISOString(), peakC: e.peak_c, status: e.status, source: e.source })),
    calibrations,
  };
}
