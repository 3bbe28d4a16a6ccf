// A fridge's count sheet: each lot with vials there and the vials the ledger expects, plus the recent counts.
import { QueryTypes, type Sequelize } from 'sequelize';
import { Fridge, Site, StockCount, StockCountLine, User } from '../../database/models/index.js';
import type { LotStatus } from '../../shared/lots/lot-status.js';
import { AppError } from '../http/app-error.js';
import { lotStatuses } from '../lots/lot-statuses.js';
import { fridgeCountStates, type FridgeCountDue } from './count-due-service.js';

export interface CountSheetLine {
  lotId: number;
  lotNumber: string;
  product: string;
  dosesPerVial: number;
  expiry: string;
  expected: number;
  status: LotStatus;
}

export interface CountSummary {
  id: number;
  countedAt: string;
  countedBy: string;
  notes: string;
  lines: { lotId: number; lotNumber: string; expected: number; counted: number; difference: number; reason: string }[];
}

export interface CountSheet {
  /** timeZone: the site's, on whose clock the counts and the due day read. */
  fridge: { id: number; code: string; name: string; siteId: number; siteName: string; timeZone: string };
  due: FridgeCountDue;
  lines: CountSheetLine[];
  recentCounts: CountSummary[];
}

export async function countSheet(sequelize: Sequelize, fridgeId: number): Promise<CountSheet> {
  const fridge = await Fridge.findByPk(fridgeId);
  if (!fridge) throw AppError.notFound('No such fridge.');
  const site = (await Site.findByPk(fridge.siteId))!;
  const rows = await sequelize.query<Omit<CountSheetLine, 'status'>>(
    `SELECT l.id AS "lotId", l.lot_number AS "lotNumber", pr.name AS product, p.doses_per_vial AS "dosesPerVial", l.expiry::text AS expiry, b.vials AS expected
       FROM stock_balances b JOIN lots l ON l.id = b.lot_id JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
      WHERE b.fridge_id = :fridgeId AND b.vials > 0
      ORDER BY l.expiry, l.lot_number`,
    { replacements: { fridgeId }, type: QueryTypes.SELECT },
  );
  const statuses = await lotStatuses(rows.map((r) => r.lotId));
  const counts = await StockCount.findAll({ where: { fridgeId }, order: [['countedAt', 'DESC'], ['id', 'DESC']], limit: 5, include: [{ model: StockCountLine, as: 'lines' }] });
  const counters = new Map((await User.findAll({ where: { id: [...new Set(counts.map((c) => c.countedBy))] }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  const lotNumbers = await lotNumbersOf(sequelize, counts.flatMap((c) => ((c as unknown as { lines: StockCountLine[] }).lines ?? []).map((l) => l.lotId)));
  const [due] = await fridgeCountStates(sequelize, { siteIds: null, fridgeId });
  return {
    fridge: { id: fridge.id, code: fridge.code, name: fridge.name, siteId: site.id, siteName: site.name, timeZone: site.timeZone },
    due: due!,
    lines: rows.map((row) => ({ ...row, status: statuses.get(row.lotId)?.status ?? 'usable' })),
    recentCounts: counts.map((count) => ({
      id: count.id,
      countedAt: count.countedAt.toISOString(),
      countedBy: counters.get(count.countedBy) ?? '',
      notes: count.notes,
      lines: ((count as unknown as { lines: StockCountLine[] }).lines ?? [])
        .sort((a, b) => a.id - b.id)
        .map((line) => ({ lotId: line.lotId, lotNumber: lotNumbers.get(line.lotId) ?? '', expected: line.expected, counted: line.counted, difference: line.difference, reason: line.reason })),
    })),
  };
}

async function lotNumbersOf(sequelize: Sequelize, lotIds: number[]): Promise<Map<number, string>> {
  if (!lotIds.length) return new Map();
  const rows = await sequelize.query<{ id: number; lot_number: string }>('SELECT id, lot_number FROM lots WHERE id IN (:lotIds)', { replacements: { lotIds: [...new Set(lotIds)] }, type: QueryTypes.SELECT });
  return new Map(rows.map((r) => [r.id, r.lot_number]));
}
