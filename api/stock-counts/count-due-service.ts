// Which fridges' stock counts are due: monthly, and after every receipt into the fridge since its last count.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { countDue, type CountDue } from '../../shared/lots/count-due.js';

export interface FridgeCountDue extends CountDue {
  fridgeId: number;
  fridgeCode: string;
  fridgeName: string;
  siteId: number;
  siteName: string;
  lastCountAt: string | null;
  lastReceiptAt: string | null;
}

interface Row {
  fridge_id: number;
  code: string;
  name: string;
  site_id: number;
  site_name: string;
  last_count_at: Date | null;
  last_receipt_at: Date | null;
}

/** Count-due state of the fridges on the given sites (null: every site), or of one fridge. */
export async function fridgeCountStates(sequelize: Sequelize, where: { siteIds: number[] | null; fridgeId?: number }, transaction?: Transaction, now = Date.now()): Promise<FridgeCountDue[]> {
  const rows = await sequelize.query<Row>(
    `SELECT f.id AS fridge_id, f.code, f.name, f.site_id, s.name AS site_name,
            (SELECT max(c.counted_at) FROM stock_counts c WHERE c.fridge_id = f.id) AS last_count_at,
            (SELECT max(m.at) FROM stock_movements m WHERE m.to_fridge_id = f.id AND m.kind = 'receive') AS last_receipt_at
       FROM fridges f JOIN sites s ON s.id = f.site_id
      WHERE (:allSites OR f.site_id IN (:siteIds)) AND (:fridgeId::int IS NULL OR f.id = :fridgeId::int)
      ORDER BY s.name, f.code`,
    { replacements: { allSites: where.siteIds === null, siteIds: where.siteIds?.length ? where.siteIds : [0], fridgeId: where.fridgeId ?? null }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => ({
    fridgeId: row.fridge_id,
    fridgeCode: row.code,
    fridgeName: row.name,
    siteId: row.site_id,
    siteName: row.site_name,
    lastCountAt: row.last_count_at?.toISOString() ?? null,
    lastReceiptAt: row.last_receipt_at?.toISOString() ?? null,
    ...countDue({ lastCountAt: row.last_count_at?.getTime() ?? null, lastReceiptAt: row.last_receipt_at?.getTime() ?? null, now }),
  }));
}
