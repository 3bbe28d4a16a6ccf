// The lots list: lots that have or had vials on the user's sites, searched, filtered, sorted and paged.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { HoldCause } from '../../shared/lots/hold-causes.js';
import type { LotFilterOptions, LotListItem, LotListPage, LotListQuery } from '../../shared/lots/lot-list.js';
import type { LotStatus } from '../../shared/lots/lot-status.js';

interface Row {
  id: number;
  lot_number: string;
  expiry: string;
  expiry_day_given: boolean;
  product_id: number;
  product: string;
  doses_per_vial: number;
  vials: number;
  status: LotStatus;
  hold_causes: HoldCause[] | null;
  sites: { id: number; name: string }[] | null;
  total: number;
}

const visibleSites = (user: Express.User) => ({ allSites: user.allSites, siteIds: user.siteIds.length ? user.siteIds : [0] });

/** ORDER BY terms per whitelisted sort key (never text from the query). */
const orderTerms: Record<string, string> = {
  expiry: 'expiry',
  lotNumber: 'lot_number COLLATE lot_number_order',
  product: 'product COLLATE list_text_order',
  vials: 'vials',
};

/**
 * Lots that passed through the fridges in scope, each with its status derived here as `shared/lots/lot-status.ts`
 * derives it (vials anywhere, discards, holds not released by a standing decision, expiry on the calendar of the site
 * that first received it): one statement filters on it, sorts, pages and counts, so only one page leaves the database.
 */
const listedLots = `
  WITH scope AS (
    SELECT f.id, f.site_id FROM fridges f
     WHERE (:allSites OR f.site_id IN (:siteIds))
       AND (:siteId::int IS NULL OR f.site_id = :siteId::int) AND (:fridgeId::int IS NULL OR f.id = :fridgeId::int)
  ), touched AS (
    SELECT m.lot_id, s.site_id FROM stock_movements m JOIN scope s ON s.id = m.to_fridge_id
    UNION
    SELECT m.lot_id, s.site_id FROM stock_movements m JOIN scope s ON s.id = m.from_fridge_id
  ), lot_sites AS (
    SELECT lot_id, array_agg(site_id ORDER BY site_id) AS site_ids FROM touched GROUP BY lot_id
  ), listed AS (
    SELECT l.id, l.lot_number, l.expiry, l.expiry_day_given, pr.id AS product_id, pr.name AS product, p.doses_per_vial, ls.site_ids,
           coalesce((SELECT sum(b.vials) FROM stock_balances b JOIN scope s ON s.id = b.fridge_id WHERE b.lot_id = l.id), 0)::int AS vials,
           coalesce((SELECT sum(b.vials) FROM stock_balances b WHERE b.lot_id = l.id), 0)::int AS vials_on_hand,
           EXISTS (SELECT 1 FROM stock_movements m WHERE m.lot_id = l.id AND m.kind = 'discard') AS discarded,
           (SELECT array_agg(c.cause ORDER BY c.first_at, c.first_id) FROM (
              SELECT h.cause, min(h.opened_at) AS first_at, min(h.id) AS first_id FROM holds h
               WHERE h.lot_id = l.id AND NOT EXISTS (
                 SELECT 1 FROM hold_decisions d WHERE d.hold_id = h.id AND d.decision IN ('release', 'release_with_condition')
                    AND NOT EXISTS (SELECT 1 FROM hold_decisions later WHERE later.supersedes_id = d.id))
               GROUP BY h.cause) c) AS hold_causes,
           (SELECT s.time_zone FROM stock_movements m JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id)
              JOIN sites s ON s.id = f.site_id WHERE m.lot_id = l.id ORDER BY m.at, m.id LIMIT 1) AS time_zone
      FROM lots l JOIN lot_sites ls ON ls.lot_id = l.id
      JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
     WHERE (:q = '' OR l.lot_number ILIKE '%' || :q || '%')
       AND (:productId::int IS NULL OR pr.id = :productId::int)
       AND (:expiryFrom::date IS NULL OR l.expiry >= :expiryFrom::date)
       AND (:expiryTo::date IS NULL OR l.expiry <= :expiryTo::date)
  ), statused AS (
    SELECT listed.*,
           CASE WHEN vials_on_hand <= 0 THEN CASE WHEN discarded THEN 'discarded' ELSE 'used_up' END
                WHEN hold_causes IS NOT NULL THEN 'on_hold'
                WHEN (CAST(:now AS timestamptz) AT TIME ZONE coalesce(time_zone, 'UTC'))::date > expiry THEN 'expired'
                ELSE 'usable' END AS status
      FROM listed
  )`;

export async function listLots(sequelize: Sequelize, user: Express.User, query: LotListQuery, now = new Date()): Promise<LotListPage> {
  const replacements = {
    ...visibleSites(user),
    siteId: query.siteId ?? null,
    fridgeId: query.fridgeId ?? null,
    q: query.q.replace(/[\\%_]/g, (c) => `\\${c}`),
    productId: query.productId ?? null,
    expiryFrom: query.expiryFrom ?? null,
    expiryTo: query.expiryTo ?? null,
    status: query.status ?? null,
    now: now.toISOString(),
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  };
  const key = query.sort.replace('-', '');
  const direction = query.sort.startsWith('-') ? 'DESC' : 'ASC';
  // Ties fall back to earliest expiry, then lot number, so pages never reshuffle.
  const rows = await sequelize.query<Row>(
    `${listedLots}
     SELECT id, lot_number, expiry::text AS expiry, expiry_day_given, product_id, product, doses_per_vial, vials, status, hold_causes,
            (SELECT json_agg(json_build_object('id', s.id, 'name', s.name) ORDER BY s.id) FROM sites s WHERE s.id = ANY (site_ids)) AS sites,
            count(*) OVER ()::int AS total
       FROM statused WHERE (:status::text IS NULL OR status = :status::text)
      ORDER BY ${orderTerms[key]} ${direction}, expiry ASC, lot_number COLLATE lot_number_order ASC, id ASC
      LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  // A page past the end has no row to carry the count: count alone then.
  const total = rows[0]?.total ?? (replacements.offset === 0 ? 0 : await countLots(sequelize, replacements));
  const items: LotListItem[] = rows.map((row) => ({
    id: row.id,
    lotNumber: row.lot_number,
    expiry: row.expiry,
    expiryDayGiven: row.expiry_day_given,
    productId: row.product_id,
    product: row.product,
    dosesPerVial: row.doses_per_vial,
    vials: row.vials,
    status: row.status,
    holdCauses: row.hold_causes ?? [],
    sites: row.sites ?? [],
  }));
  return { items, total, page: query.page, pageSize: query.pageSize };
}

async function countLots(sequelize: Sequelize, replacements: Record<string, unknown>): Promise<number> {
  const [row] = await sequelize.query<{ total: number }>(
    `${listedLots} SELECT count(*)::int AS total FROM statused WHERE (:status::text IS NULL OR status = :status::text)`,
    { replacements, type: QueryTypes.SELECT },
  );
  return row?.total ?? 0;
}

/** What the list's filter form offers: the user's sites and fridges, and the products of lots on them. */
export async function lotFilterOptions(sequelize: Sequelize, user: Express.User): Promise<LotFilterOptions> {
  const replacements = visibleSites(user);
  const sites = await sequelize.query<{ id: number; name: string }>(
    'SELECT id, name FROM sites WHERE (:allSites OR id IN (:siteIds)) ORDER BY name', { replacements, type: QueryTypes.SELECT });
  const fridges = await sequelize.query<LotFilterOptions['fridges'][number]>(
    `SELECT f.id, f.code, f.name, f.site_id AS "siteId", s.time_zone AS "timeZone" FROM fridges f JOIN sites s ON s.id = f.site_id
      WHERE (:allSites OR f.site_id IN (:siteIds)) ORDER BY f.code`, { replacements, type: QueryTypes.SELECT });
  const products = await sequelize.query<{ id: number; name: string }>(
    `SELECT DISTINCT pr.id, pr.name FROM products pr JOIN presentations p ON p.product_id = pr.id JOIN lots l ON l.presentation_id = p.id
       JOIN stock_movements m ON m.lot_id = l.id JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id)
      WHERE (:allSites OR f.site_id IN (:siteIds)) ORDER BY pr.name`, { replacements, type: QueryTypes.SELECT });
  return { products, sites, fridges };
}
