// The sites a lot belongs to: every site where it has or had vials (from its movements), for access and lists.
import { QueryTypes, type Transaction } from 'sequelize';
import type { Request } from 'express';
import { Lot } from '../../database/models/index.js';
import { canSeeSite } from '../http/access.js';
import { parseIdParam } from '../http/params.js';

export async function lotSiteIds(lotId: number, transaction?: Transaction): Promise<number[]> {
  const rows = await Lot.sequelize!.query<{ site_id: number }>(
    `SELECT DISTINCT f.site_id FROM stock_movements m
       JOIN fridges f ON f.id = m.from_fridge_id OR f.id = m.to_fridge_id
      WHERE m.lot_id = :lotId ORDER BY f.site_id`,
    { replacements: { lotId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => row.site_id);
}

/** For the access guard: a site of the lot the user may see, else any of its sites (the guard then answers 404). */
export async function lotSiteForUser(req: Request): Promise<number | null> {
  const sites = await lotSiteIds(parseIdParam(req.params.lotId));
  if (!sites.length) return null;
  return (req.user && sites.find((id) => canSeeSite(req.user!, id))) ?? sites[0]!;
}
