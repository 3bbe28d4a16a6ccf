// Each lot's derived status (usable, on hold, expired, discarded, used up) with the holds that stand, read in bulk.
import { QueryTypes, type Transaction } from 'sequelize';
import { Lot } from '../../database/models/index.js';
import type { HoldView } from '../../shared/lots/hold-causes.js';
import { lotStatus, type LotStatus } from '../../shared/lots/lot-status.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { undecidedHoldsByLot } from './holds.js';

export interface LotStatusView {
  status: LotStatus;
  vialsOnHand: number;
  holds: HoldView[];
}

interface Row {
  id: number;
  expiry: string;
  vials: number;
  discarded: boolean;
  time_zone: string | null;
}

export async function lotStatuses(lotIds: number[], transaction?: Transaction, now = new Date()): Promise<Map<number, LotStatusView>> {
  const result = new Map<number, LotStatusView>();
  if (!lotIds.length) return result;
  const rows = await Lot.sequelize!.query<Row>(
    `SELECT l.id, l.expiry::text AS expiry,
            coalesce((SELECT sum(b.vials) FROM stock_balances b WHERE b.lot_id = l.id), 0)::int AS vials,
            EXISTS (SELECT 1 FROM stock_movements m WHERE m.lot_id = l.id AND m.kind = 'discard') AS discarded,
            -- "Today" on the calendar of the site where the lot was first received.
            (SELECT s.time_zone FROM stock_movements m JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id)
               JOIN sites s ON s.id = f.site_id WHERE m.lot_id = l.id ORDER BY m.at, m.id LIMIT 1) AS time_zone
       FROM lots l WHERE l.id IN (:lotIds)`,
    { replacements: { lotIds: [...new Set(lotIds)] }, type: QueryTypes.SELECT, transaction },
  );
  const holds = await undecidedHoldsByLot(lotIds, transaction);
  for (const row of rows) {
    const standing = holds.get(row.id) ?? [];
    const today = siteLocalDate(now, row.time_zone ?? 'UTC');
    const status = lotStatus({ expiry: row.expiry, today, holds: standing.map(() => ({ decision: null })), vialsOnHand: row.vials, discarded: row.discarded });
    result.set(row.id, { status, vialsOnHand: row.vials, holds: standing });
  }
  return result;
}
