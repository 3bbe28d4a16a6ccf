// Gathers a fridge's monthly record: daily minimum and maximum, the recorded checks, the excursions and what was done,
// and the time without readings, counted the same way for each day and for the month.
import { DateTime } from 'luxon';
import { Op, QueryTypes, type Sequelize } from 'sequelize';
import type { MonthlyRecord, MonthlyRecordDay } from '../../shared/fridges/monthly-record.js';
import { siteMonthBounds } from '../../shared/fridges/site-date.js';
import { nominalIntervalMs } from '../../shared/logs/nominal-interval.js';
import { DailyCheck, Excursion, Fridge, Site } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';

interface Span {
  start: number;
  end: number;
}

/** Minutes of the spans inside [from, to). */
function minutesWithin(spans: readonly Span[], from: number, to: number): number {
  let ms = 0;
  for (const span of spans) ms += Math.max(0, Math.min(span.end, to) - Math.max(span.start, from));
  return ms / 60_000;
}

/**
 * Where the fridge's series (its primaries, and its backup where it filled a primary gap) starts and stops: the first
 * reading, the last, and the end of the time the last one stands for (one interval of its logger, as the analysis
 * counts it; a backup fill already ends there).
 */
async function seriesBounds(sequelize: Sequelize, fridgeId: number): Promise<{ first: number | null; last: number | null; coveredTo: number | null }> {
  const replacements = { fridgeId };
  // Per logger through its (logger_id, at) key, so a fridge with years of readings costs a few index probes.
  const [bounds] = await sequelize.query<{ first_primary: Date | null; first_fill: Date | null; last_fill_start: Date | null; last_fill_end: Date | null }>(
    `SELECT (SELECT min(x.at) FROM loggers l CROSS JOIN LATERAL (SELECT r.at FROM readings r WHERE r.logger_id = l.id ORDER BY r.at LIMIT 1) x
              WHERE l.fridge_id = :fridgeId AND l.role = 'primary') AS first_primary,
            (SELECT min(starts_at) FROM backup_fills WHERE fridge_id = :fridgeId) AS first_fill,
            f.starts_at AS last_fill_start, f.ends_at AS last_fill_end
     FROM (SELECT 1) one LEFT JOIN LATERAL (SELECT starts_at, ends_at FROM backup_fills WHERE fridge_id = :fridgeId ORDER BY ends_at DESC LIMIT 1) f ON true`,
    { replacements, type: QueryTypes.SELECT },
  );
  const latest = await sequelize.query<{ at: Date }>(
    `SELECT x.at FROM loggers l CROSS JOIN LATERAL (SELECT r.at FROM readings r WHERE r.logger_id = l.id ORDER BY r.at DESC LIMIT 25) x
     WHERE l.fridge_id = :fridgeId AND l.role = 'primary' ORDER BY x.at DESC LIMIT 25`,
    { replacements, type: QueryTypes.SELECT },
  );
  const firsts = [bounds?.first_primary, bounds?.first_fill].filter((d): d is Date => d instanceof Date).map((d) => d.getTime());
  const first = firsts.length ? Math.min(...firsts) : null;
  const recent = latest.map((r) => ({ at: r.at.getTime() })).reverse();
  const interval = nominalIntervalMs(recent);
  const lastPrimary = recent.length ? recent[recent.length - 1]!.at : null;
  const primaryTo = lastPrimary === null ? null : lastPrimary + (Number.isFinite(interval) ? interval : 0);
  const fillTo = bounds?.last_fill_end?.getTime() ?? null;
  if (fillTo !== null && (primaryTo === null || fillTo > primaryTo)) {
    const [backup] = await sequelize.query<{ at: Date | null }>(
      `SELECT max(r.at) AS at FROM readings r JOIN loggers l ON l.id = r.logger_id
       WHERE l.fridge_id = :fridgeId AND l.role = 'backup' AND r.at >= :from AND r.at < :to`,
      { replacements: { fridgeId, from: bounds!.last_fill_start!.toISOString(), to: bounds!.last_fill_end!.toISOString() }, type: QueryTypes.SELECT },
    );
    return { first, last: backup?.at?.getTime() ?? fillTo, coveredTo: fillTo };
  }
  return { first, last: lastPrimary, coveredTo: primaryTo };
}

export async function monthlyRecord(sequelize: Sequelize, fridgeId: number, requested: string | undefined, now = new Date()): Promise<MonthlyRecord> {
  const fridge = (await Fridge.findByPk(fridgeId, { include: [{ model: Site, as: 'site' }] })) as (Fridge & { site?: Site }) | null;
  if (!fridge?.site) throw AppError.notFound('No such fridge.');
  const zone = fridge.site.timeZone;
  const month = requested ?? DateTime.fromJSDate(now, { zone }).toFormat('yyyy-MM');
  const { start, end: monthEnd } = siteMonthBounds(month, zone);
  if (start >= now.getTime()) throw AppError.badRequest('There is no record yet for a month that has not begun.', [{ field: 'month', message: 'This month has not begun at the site.' }]);
  // A month still running stops now: the days after today have no readings to show yet, and are not listed.
  const end = Math.min(monthEnd, now.getTime());
  const replacements = { fridgeId, start: new Date(start).toISOString(), end: new Date(end).toISOString(), zone };
  // The fridge's series: its primary loggers, and its backup's readings where they filled a primary gap.
  const daily = await sequelize.query<{ day: string; min_c: number; max_c: number; n: string; backup_n: string }>(
    `SELECT to_char(r.at AT TIME ZONE :zone, 'YYYY-MM-DD') AS day, min(r.temp_c) AS min_c, max(r.temp_c) AS max_c, count(*) AS n,
            count(*) FILTER (WHERE l.role = 'backup') AS backup_n
     FROM readings r JOIN loggers l ON l.id = r.logger_id
     WHERE l.fridge_id = :fridgeId AND r.at >= :start AND r.at < :end
       AND (l.role = 'primary' OR EXISTS (SELECT 1 FROM backup_fills f WHERE f.fridge_id = :fridgeId AND r.at >= f.starts_at AND r.at < f.ends_at))
     GROUP BY 1`,
    { replacements, type: QueryTypes.SELECT },
  );
  const checks = await DailyCheck.findAll({ where: { fridgeId, checkedAt: { [Op.gte]: new Date(start), [Op.lt]: new Date(end) } }, order: [['checkedAt', 'ASC']] });
  const excursions = await Excursion.findAll({ where: { fridgeId, endsAt: { [Op.gte]: new Date(start) }, startsAt: { [Op.lt]: new Date(end) } }, order: [['startsAt', 'ASC']] });
  const gaps = await sequelize.query<{ starts_at: Date; ends_at: Date }>(
    'SELECT starts_at, ends_at FROM fridge_gaps WHERE fridge_id = :fridgeId AND ends_at > :start AND starts_at < :end',
    { replacements, type: QueryTypes.SELECT },
  );

  // Time without readings counts from the fridge's first stored reading, not from a logger's installation date:
  // installed_on defaults to the day the logger was entered in Vialyard, and older files are often uploaded for it
  // later (the demo's loggers say 2025, the tests' say today with readings from March), so that date bounds neither
  // side of the data. Before the first reading Vialyard knows nothing of the fridge; the record says where its
  // readings start and leaves the days before uncounted rather than calling them all time without readings.
  const series = await seriesBounds(sequelize, fridgeId);
  const countFrom = series.first === null || series.first >= end ? null : Math.max(start, series.first);
  const spans: Span[] = gaps.map((g) => ({ start: g.starts_at.getTime(), end: g.ends_at.getTime() }));
  // Nothing after the last reading (the logger stopped, or its next file is not uploaded yet): no stored gap ends
  // there, so the time from it to the record's end is added here.
  const stopped = countFrom !== null && series.coveredTo !== null && series.coveredTo < end;
  const tail: Span[] = stopped ? [{ start: Math.max(countFrom, series.coveredTo!), end }] : [];
  spans.push(...tail);

  const days: MonthlyRecordDay[] = [];
  for (let day = DateTime.fromMillis(start, { zone }); day.toMillis() < end; day = day.plus({ days: 1 })) {
    const date = day.toISODate()!;
    const dayStart = day.toMillis();
    const dayEnd = Math.min(day.plus({ days: 1 }).toMillis(), end);
    const figures = daily.find((d) => d.day === date);
    days.push({
      date,
      minC: figures?.min_c ?? null,
      maxC: figures?.max_c ?? null,
      readings: Number(figures?.n ?? 0),
      backupReadings: Number(figures?.backup_n ?? 0),
      minutesWithoutReadings: countFrom === null || dayEnd <= countFrom ? null : minutesWithin(spans, Math.max(dayStart, countFrom), dayEnd),
      checks: checks
        .filter((c) => DateTime.fromJSDate(c.checkedAt, { zone }).toISODate() === date)
        .map((c) => ({ time: DateTime.fromJSDate(c.checkedAt, { zone }).toFormat('HH:mm'), currentC: c.currentC, minC: c.minC, maxC: c.maxC, initials: c.initials })),
    });
  }
  return {
    fridge: { code: fridge.code, name: fridge.name, place: fridge.place, siteName: fridge.site.name, timeZone: zone },
    month,
    through: days[days.length - 1]!.date,
    inProgress: end < monthEnd,
    alarm: { low: fridge.alarmLow, high: fridge.alarmHigh, unit: fridge.alarmUnit },
    days,
    excursions: excursions.map((e) => ({ kind: e.kind, start: e.startsAt.toISOString(), end: e.endsAt.toISOString(), minutes: e.minutes, peakC: e.peakC, status: e.status, actionTaken: e.actionTaken, source: e.source })),
    countedFrom: countFrom === null ? null : new Date(countFrom).toISOString(),
    readingsStart: countFrom !== null && countFrom > start ? new Date(countFrom).toISOString() : null,
    lastReading: stopped && series.last !== null ? new Date(series.last).toISOString() : null,
    gapMinutes: days.reduce((sum, d) => sum + (d.minutesWithoutReadings ?? 0), 0),
    minutesAfterLastReading: countFrom === null ? 0 : minutesWithin(tail, countFrom, end),
    generatedAt: now.toISOString(),
  };
}
