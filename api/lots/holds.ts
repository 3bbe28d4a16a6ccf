// Holds on lots: opening one, and reading the undecided ones that make a lot "do not use" wherever it appears.
import { QueryTypes, type Transaction } from 'sequelize';
import { Hold, User } from '../../database/models/index.js';
import type { HoldCause, HoldView } from '../../shared/lots/hold-causes.js';
import { notifyHoldOpened } from '../notifications/hold-notifications.js';

export interface HoldInput {
  lotId: number;
  cause: HoldCause;
  sourceKind: string;
  sourceId: number | null;
  reason: string;
  openedBy: number | null;
}

/**
 * Opens a hold once per lot, cause and source; a repeat (two lines of one lot in one shipment) adds nothing.
 * A new hold notifies the veterinarians, storage staff and admins of the lot's sites (one notification per event
 * and user) in the same transaction; the e-mail copies go out after it commits. Returns the new hold's id, or null.
 */
export async function openHold(hold: HoldInput, transaction: Transaction): Promise<number | null> {
  const [rows] = (await Hold.sequelize!.query(
    `INSERT INTO holds (lot_id, cause, source_kind, source_id, reason, opened_by)
     VALUES (:lotId, :cause, :sourceKind, :sourceId, :reason, :openedBy)
     ON CONFLICT (lot_id, cause, source_kind, source_id) DO NOTHING
     RETURNING id`,
    { replacements: { ...hold }, type: QueryTypes.INSERT, transaction },
  )) as unknown as [{ id: number }[], number];
  const id = rows[0]?.id ?? null;
  if (id !== null) await notifyHoldOpened(transaction, hold);
  return id;
}

/**
 * The holds that keep each lot from use: every hold whose current decision (the one nobody superseded) is not
 * a release. A discard decision keeps the hold here; the discard movement empties the lot anyway.
 */
export async function undecidedHoldsByLot(lotIds: number[], transaction?: Transaction): Promise<Map<number, HoldView[]>> {
  const byLot = new Map<number, HoldView[]>();
  if (!lotIds.length) return byLot;
  const released = new Set(
    (
      await Hold.sequelize!.query<{ hold_id: number }>(
        `SELECT d.hold_id FROM hold_decisions d JOIN holds h ON h.id = d.hold_id
         WHERE h.lot_id IN (:lotIds) AND d.decision IN ('release', 'release_with_condition')
           AND NOT EXISTS (SELECT 1 FROM hold_decisions later WHERE later.supersedes_id = d.id)`,
        { replacements: { lotIds: [...new Set(lotIds)] }, type: QueryTypes.SELECT, transaction },
      )
    ).map((row) => row.hold_id),
  );
  const holds = (await Hold.findAll({ where: { lotId: [...new Set(lotIds)] }, order: [['openedAt', 'ASC'], ['id', 'ASC']], transaction }))
    .filter((hold) => !released.has(hold.id));
  const openerIds = [...new Set(holds.map((h) => h.openedBy).filter((id): id is number => id !== null))];
  const openers = new Map((await User.findAll({ where: { id: openerIds }, attributes: ['id', 'name'], transaction })).map((u) => [u.id, u.name]));
  for (const hold of holds) {
    const view: HoldView = {
      id: hold.id,
      lotId: hold.lotId,
      cause: hold.cause,
      sourceKind: hold.sourceKind,
      sourceId: hold.sourceId,
      reason: hold.reason,
      openedAt: hold.openedAt.toISOString(),
      openedBy: hold.openedBy === null ? null : (openers.get(hold.openedBy) ?? null),
    };
    byLot.set(hold.lotId, [...(byLot.get(hold.lotId) ?? []), view]);
  }
  return byLot;
}
