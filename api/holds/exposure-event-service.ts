// One exposure event as the review and the report read it: its figures, its title, whether its holds are all decided.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { exposureEventTitle } from '../../shared/exposure/exposure-event-title.js';
import type { ExposureEventView } from '../../shared/lots/exposure-event-view.js';
import { ExposureEvent, Fridge } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';
import { exposureSourceKind } from './exposure-holds.js';

/** The site an event belongs to, for access: its fridge's. */
export async function exposureEventSiteId(id: number): Promise<number | null> {
  const event = await ExposureEvent.findByPk(id, { attributes: ['fridgeId'] });
  if (!event) return null;
  return (await Fridge.findByPk(event.fridgeId, { attributes: ['siteId'] }))?.siteId ?? null;
}

/** Whether every hold of the event has a decision (an event with no hold counts as decided: nothing is waiting). */
export async function exposureEventDecided(sequelize: Sequelize, id: number, transaction?: Transaction): Promise<boolean> {
  const [row] = await sequelize.query<{ waiting: number }>(
    `SELECT count(*)::int AS waiting FROM holds h
      WHERE h.source_kind = :kind AND h.source_id = :id AND NOT EXISTS (SELECT 1 FROM hold_decisions d WHERE d.hold_id = h.id)`,
    { replacements: { kind: exposureSourceKind, id }, type: QueryTypes.SELECT, transaction },
  );
  return (row?.waiting ?? 0) === 0;
}

export function toExposureEventView(row: ExposureEvent, fridge: Fridge, decided: boolean): ExposureEventView {
  const fridgeAlarmed = row.cause === 'freeze'
    ? row.peakC < row.fridgeLowC
    : row.kind === 'high' ? row.peakC > row.fridgeHighC + 0.001 : row.peakC < row.fridgeLowC - 0.001;
  return {
    id: row.id,
    fridgeId: row.fridgeId,
    fridgeName: fridge.name,
    siteId: fridge.siteId,
    cause: row.cause,
    source: row.source,
    kind: row.kind,
    start: row.startsAt.toISOString(),
    end: row.endsAt.toISOString(),
    minutes: row.minutes,
    peakC: row.peakC,
    degreeMinutesC: row.degreeMinutesC,
    mkt24hC: row.mkt24hC,
    openEnded: row.openEnded,
    lowC: row.lowC,
    highC: row.highC,
    fridgeLowC: row.fridgeLowC,
    fridgeHighC: row.fridgeHighC,
    fridgeAlarmed,
    followUpOfId: row.followUpOfId,
    title: exposureEventTitle({ cause: row.cause, kind: row.kind, source: row.source, fridgeName: fridge.name, lowC: row.lowC, highC: row.highC, fridgeAlarmed }),
    decided,
  };
}

export async function exposureEventView(sequelize: Sequelize, id: number): Promise<ExposureEventView> {
  const row = await ExposureEvent.findByPk(id);
  const fridge = row && (await Fridge.findByPk(row.fridgeId));
  if (!row || !fridge) throw AppError.notFound('No such exposure event.');
  return toExposureEventView(row, fridge, await exposureEventDecided(sequelize, id));
}
