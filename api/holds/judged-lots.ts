// The lots that ever had vials in a fridge, each with its product's own range and its stays per fridge (from the ledger).
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { movementHistory, staysFromBalanceChanges, type LedgerMovement } from '../../shared/exposure/index.js';
import type { JudgedLot } from '../../shared/exposure/product-exposure-runs.js';
import { rangeInCelsius } from '../../shared/temperature/temperature-range.js';

interface MovementRow {
  lot_id: number;
  kind: LedgerMovement['kind'];
  vials: number;
  from_fridge_id: number | null;
  to_fridge_id: number | null;
  left_at: Date | null;
  at: Date;
  source_kind: string;
  source_id: number | null;
  storage_low: string;
  storage_high: string;
  storage_unit: 'F' | 'C';
  freeze_sensitive: boolean;
}

export interface JudgedLotFacts extends JudgedLot {
  range: { low: number; high: number; unit: 'F' | 'C' };
}

export async function judgedLotsOfFridge(sequelize: Sequelize, transaction: Transaction, fridgeId: number): Promise<JudgedLotFacts[]> {
  const rows = await sequelize.query<MovementRow>(
    `SELECT m.lot_id, m.kind, m.vials, m.from_fridge_id, m.to_fridge_id, m.left_at, m.at, m.source_kind, m.source_id,
            pr.storage_low, pr.storage_high, pr.storage_unit, pr.freeze_sensitive
       FROM stock_movements m JOIN lots l ON l.id = m.lot_id JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
      WHERE m.lot_id IN (SELECT lot_id FROM stock_movements WHERE from_fridge_id = :fridgeId OR to_fridge_id = :fridgeId)
      ORDER BY m.lot_id, m.at, m.id`,
    { replacements: { fridgeId }, type: QueryTypes.SELECT, transaction },
  );
  const byLot = new Map<number, MovementRow[]>();
  for (const row of rows) byLot.set(row.lot_id, [...(byLot.get(row.lot_id) ?? []), row]);
  return [...byLot.entries()].map(([lotId, movements]) => {
    const history = movementHistory(
      movements.map((m) => ({
        kind: m.kind, vials: m.vials, fromFridgeId: m.from_fridge_id, toFridgeId: m.to_fridge_id,
        leftAt: m.left_at ? new Date(m.left_at).getTime() : null, at: new Date(m.at).getTime(), sourceKind: m.source_kind, sourceId: m.source_id,
      })),
    );
    const first = movements[0];
    const range = { low: Number(first.storage_low), high: Number(first.storage_high), unit: first.storage_unit };
    return { lotId, range, limits: rangeInCelsius(range), freezeSensitive: first.freeze_sensitive, stays: staysFromBalanceChanges(history.changes) };
  });
}
