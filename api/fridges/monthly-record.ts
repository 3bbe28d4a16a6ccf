// Gathers a fridge's monthly record: daily minimum and maximum, the recorded checks, the excursions and what was done.
import { DateTime } from 'luxon';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { MonthlyRecord, MonthlyRecordDay } from '../../shared/fridges/monthly-record.js';
import { siteMonthBounds } from '../../shared/fridges/site-date.js';
import { DailyCheck, Excursion, Fridge, Site } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';

export async function monthlyRecord(sequelize: Sequelize, fridgeId: number, requested: string | undefined, now = new Date()): Promise<MonthlyRecord> {
  const fridge = (await Fridge.findByPk(fridgeId, { include: [{ model: Site, as: 'site' }] })) as (Fridge & { site?: Site }) | null;
  if (!fridge?.site) throw AppError.notFound('No such fridge.');
  const zone = fridge.site.timeZone;
  const month = requested ?? DateTime.fromJSDate(now, { zone }).toFormat('yyyy-MM');
  const { start, end } = siteMonthBounds(month, zone);
  const replacements = { fridgeId, start: new Date(start).toISOString(), end: new Date(end).toISOString(), zone };
  // The fridge's series: its primary loggers, and its backup's readings where they filled a primary gap.
  const daily = await sequelize.query<{ day: string; min_c: number; max_c: number; n: string }>(
    `SELECT to_char(r.at AT TIME ZONE :zone, 'YYYY-MM-DD') AS day, min(r.temp_c) AS min_c, max(r.temp_c) AS max_c, count(*) AS n
     FROM readings r JOIN loggers l ON l.id = r.logger_id
     WHERE l.fridge_id = :fridgeId AND r.at >= :start AND r.at < :end
       AND (l.role = 'primary' OR EXISTS (SELECT 1 FROM backup_fills f WHERE f.fridge_id = :fridgeId AND r.at >= f.starts_at AND r.at < f.ends_at))
     GROUP BY 1`,
    { replacements, type: QueryTypes.SELECT },
  );
  const checks = await DailyCheck.findAll({ where: { fridgeId }, order: [['checkedAt', 'ASC']] }).then((rows) => rows.filter((c) => c.checkedAt.getTime() >= start && c.checkedAt.getTime() < end));
  const days: MonthlyRecordDay[] = [];
  for (let day = DateTime.fromMillis(start, { zone }); day.toMillis() < end; day = day.plus({ days: 1 })) {
    const date = day.toISODate()!;
    const figures = daily.find((d) => d.day === date);
    days.push({
      date,
      minC: figures?.min_c ?? null,
      maxC: figures?.max_c ?? null,
      readings: Number(figures?.n ?? 0),
      checks: checks
        .filter((c) => DateTime.fromJSDate(c.checkedAt, { zone }).toISODate() === date)
        .map((c) => ({ time: DateTime.fromJSDate(c.checkedAt, { zone }).toFormat('HH:mm'), currentC: c.currentC, minC: c.minC, maxC: c.maxC, initials: c.initials })),
    });
  }
  const excursions = await Excursion.findAll({ where: { fridgeId }, order: [['startsAt', 'ASC']] }).then((rows) => rows.filter((e) => e.endsAt.getTime() >= start && e.startsAt.getTime() < end));
  const [gap] = await sequelize.query<{ minutes: number | null }>(
    `SELECT sum(extract(epoch FROM least(ends_at, :end::timestamptz) - greatest(starts_at, :start::timestamptz)) / 60) AS minutes
     FROM fridge_gaps WHERE fridge_id = :fridgeId AND ends_at > :start AND starts_at < :end`,
    { replacements, type: QueryTypes.SELECT },
  );
  return {
    fridge: { code: fridge.code, name: fridge.name, place: fridge.place, siteName: fridge.site.name, timeZone: zone },
    month,
    alarm: { low: fridge.alarmLow, high: fridge.alarmHigh, unit: fridge.alarmUnit },
    days,
    excursions: excursions.map((e) => ({ kind: e.kind, start: e.startsAt.toISOString(), end: e.endsAt.toISOString(), minutes: e.minutes, peakC: e.peakC, status: e.status, actionTaken: e.actionTaken, source: e.source })),
    gapMinutes: Number(gap?.minutes ?? 0),
    generatedAt: now.toISOString(),
  };
}
