// Holds on lots: opening one, and reading the undecided ones that make a lot "do not use" wherever it appears.
import { QueryTypes, type Transaction } from 'sequelize';
import { Hold, User } from '../../database/models/index.js';
import type { HoldCause, HoldView } from '../../shared/lots/hold-causes.js';

export interface HoldInput {
  lotId: number;
  cause: HoldCause;
  sourceKind: string;
  sourceId: number | null;
  reason: string;
  openedBy: number | null;
}

/** Opens a hold once per lot, cause and source; a repeat (two lines of one lot in one shipment) adds nothing. */
export async function openHold(hold: HoldInput, transaction: Transaction): Promise<void> {
  await Hold.sequelize!.query(
    `INSERT INTO holds (lot_id, cause, source_kind, source_id, reason, opened_by)
     VALUES (:lotId, :cause, :sourceKind, :sourceId, :reason, :openedBy)
     ON CONFLICT (lot_id, cause, source_kind, source_id) DO NOTHING`,
    { replacements: { ...hold }, type: QueryTypes.INSERT, transaction },
  );
}

/**
 * The holds still waiting for the veterinarian, by lot. Receiving records no decisions, so every hold is
 * undecided here; the lots feature narrows this to holds without a decision in their favour.
 */
export async function undecidedHoldsByLot(lotIds: number[], transaction?: Transaction): Promise<Map<number, HoldView[]>> {
  const byLot = new Map<number, HoldView[]>();
  if (!lotIds.length) return byLot;
  const holds = await Hold.findAll({ where: { lotId: [...new Set(lotIds)] }, order: [['openedAt', 'ASC'], ['id', 'ASC']], transaction });
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
