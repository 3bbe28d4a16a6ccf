// What each fridge's card and row say now: newest reading, open excursions, today's checks, calibrations due.
import { QueryTypes, type Sequelize } from 'sequelize';
import { CALIBRATION_REMINDER_DAYS } from '../../shared/fridges/calibration-status.js';
import { checksNeededPerDay } from '../../shared/fridges/checks-needed.js';
import type { FridgeStatus } from '../../shared/fridges/fridge-schemas.js';
import { hasNoRecentData } from '../../shared/fridges/no-recent-data.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import { Fridge, Site } from '../../database/models/index.js';
import { toFridgeView, type FridgeWithSite } from './fridge-view.js';

interface StatusRow {
  id: number;
  newest: Date | null;
  open_excursions: string;
  checks_today: string;
  loggers: string;
  calibrations_due: string;
}

/** Visible fridges (all when `siteIds` is undefined), by site then code. `now` is a parameter so tests can move it. */
export async function fridgeStatuses(sequelize: Sequelize, siteIds: number[] | undefined, now = new Date()): Promise<FridgeStatus[]> {
  const where = siteIds === undefined ? {} : { siteId: siteIds };
  const fridges: FridgeWithSite[] = await Fridge.findAll({ where, include: [{ model: Site, as: 'site' }], order: [['code', 'ASC']] });
  if (!fridges.length) return [];
  const rows = await sequelize.query<StatusRow>(
    `SELECT f.id,
       (SELECT max(r.at) FROM loggers l
          CROSS JOIN LATERAL (SELECT at FROM readings WHERE logger_id = l.id ORDER BY at DESC LIMIT 1) r
          WHERE l.fridge_id = f.id) AS newest,
       (SELECT count(*) FROM excursions e WHERE e.fridge_id = f.id AND e.status <> 'decided') AS open_excursions,
       (SELECT count(*) FROM daily_checks c WHERE c.fridge_id = f.id
          AND c.checked_at >= date_trunc('day', :now::timestamptz, s.time_zone)
          AND c.checked_at < ((date_trunc('day', :now::timestamptz, s.time_zone) AT TIME ZONE s.time_zone) + interval '1 day') AT TIME ZONE s.time_zone
       ) AS checks_today,
       (SELECT count(*) FROM loggers l WHERE l.fridge_id = f.id AND l.removed_on IS NULL) AS loggers,
       (SELECT count(*) FROM loggers l WHERE l.fridge_id = f.id AND l.removed_on IS NULL
          AND coalesce((SELECT max(c.due_on) FROM logger_certificates c WHERE c.logger_id = l.id), '-infinity'::date)
              <= (:now::timestamptz AT TIME ZONE s.time_zone)::date + :reminderDays
       ) AS calibrations_due
     FROM fridges f JOIN sites s ON s.id = f.site_id
     WHERE f.id IN (:ids)`,
    { replacements: { ids: fridges.map((f) => f.id), now: now.toISOString(), reminderDays: CALIBRATION_REMINDER_DAYS }, type: QueryTypes.SELECT },
  );
  const byId = new Map(rows.map((row) => [row.id, row]));
  return fridges
    .sort((a, b) => a.site!.name.localeCompare(b.site!.name) || a.code.localeCompare(b.code))
    .map((fridge) => {
      const row = byId.get(fridge.id)!;
      const { staleDataHours } = siteSettingsSchema.parse(fridge.site!.settings ?? {});
      const newest = row.newest ? new Date(row.newest) : null;
      return {
        ...toFridgeView(fridge),
        newestReadingAt: newest?.toISOString() ?? null,
        noRecentData: hasNoRecentData(newest?.getTime() ?? null, now.getTime(), staleDataHours),
        staleDataHours,
        openExcursions: Number(row.open_excursions),
        checksToday: Number(row.checks_today),
        checksNeeded: checksNeededPerDay(fridge.minMaxDisplay),
        loggerCount: Number(row.loggers),
        calibrationsDue: Number(row.calibrations_due),
      };
    });
}
