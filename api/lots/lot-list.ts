// The lots list: lots that have or had vials on the user's sites, searched, filtered, sorted and paged.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { LotFilterOptions, LotListItem, LotListPage, LotListQuery } from '../../shared/lots/lot-list.js';
import { lotStatuses } from './lot-statuses.js';

interface Row {
  id: number;
  lot_number: string;
  expiry: string;
  expiry_day_given: boolean;
  product_id: number;
  product: string;
  doses_per_vial: number;
  vials: number;
  site_ids: number[];
}

const visibleSites = (user: Express.User) => ({ allSites: user.allSites, siteIds: user.siteIds.length ? user.siteIds : [0] });

const compare: Record<string, (a: LotListItem, b: LotListItem) => number> = {
  expiry: (a, b) => a.expiry.localeCompare(b.expiry),
  lotNumber: (a, b) => a.lotNumber.localeCompare(b.lotNumber, 'en', { numeric: true }),
  product: (a, b) => a.product.localeCompare(b.product),
  vials: (a, b) => a.vials - b.vials,
};

export async function listLots(sequelize: Sequelize, user: Express.User, query: LotListQuery): Promise<LotListPage> {
  // Fridges in scope: on the user's sites, narrowed by the site or fridge filter.
  const rows = await sequelize.query<Row>(
    `WITH scope AS (
       SELECT f.id, f.site_id FROM fridges f
        WHERE (:allSites OR f.site_id IN (:siteIds))
          AND (:siteId::int IS NULL OR f.site_id = :siteId::int) AND (:fridgeId::int IS NULL OR f.id = :fridgeId::int)
     ), touched AS (
       SELECT DISTINCT m.lot_id, s.site_id FROM stock_movements m JOIN scope s ON s.id = m.from_fridge_id OR s.id = m.to_fridge_id
     )
     SELECT l.id, l.lot_number, l.expiry::text AS expiry, l.expiry_day_given, pr.id AS product_id, pr.name AS product, p.doses_per_vial,
            coalesce((SELECT sum(b.vials) FROM stock_balances b JOIN scope s ON s.id = b.fridge_id WHERE b.lot_id = l.id), 0)::int AS vials,
            (SELECT array_agg(t.site_id ORDER BY t.site_id) FROM touched t WHERE t.lot_id = l.id) AS site_ids
       FROM lots l JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
      WHERE l.id IN (SELECT lot_id FROM touched)
        AND (:q = '' OR l.lot_number ILIKE '%' || :q || '%')
        AND (:productId::int IS NULL OR pr.id = :productId::int)
        AND (:expiryFrom::date IS NULL OR l.expiry >= :expiryFrom::date)
        AND (:expiryTo::date IS NULL OR l.expiry <= :expiryTo::date)`,
    {
      replacements: {
        ...visibleSites(user),
        siteId: query.siteId ?? null,
        fridgeId: query.fridgeId ?? null,
        q: query.q.replace(/[\\%_]/g, (c) => `\\${c}`),
        productId: query.productId ?? null,
        expiryFrom: query.expiryFrom ?? null,
        expiryTo: query.expiryTo ?? null,
      },
      type: QueryTypes.SELECT,
    },
  );
  const statuses = await lotStatuses(rows.map((r) => r.id));
  const siteNames = await siteNamesOf(sequelize, rows.flatMap((r) => r.site_ids ?? []));
  let items: LotListItem[] = rows.map((row) => {
    const state = statuses.get(row.id)!;
    return {
      id: row.id,
      lotNumber: row.lot_number,
      expiry: row.expiry,
      expiryDayGiven: row.expiry_day_given,
      productId: row.product_id,
      product: row.product,
      dosesPerVial: row.doses_per_vial,
      vials: row.vials,
      status: state.status,
      holdCauses: [...new Set(state.holds.map((h) => h.cause))],
      sites: (row.site_ids ?? []).map((id) => ({ id, name: siteNames.get(id) ?? '' })),
    };
  });
  if (query.status) items = items.filter((item) => item.status === query.status);
  const descending = query.sort.startsWith('-');
  const by = compare[query.sort.replace('-', '')]!;
  // Ties fall back to earliest expiry, then lot number, so pages never reshuffle.
  items.sort((a, b) => (descending ? -by(a, b) : by(a, b)) || compare.expiry!(a, b) || compare.lotNumber!(a, b) || a.id - b.id);
  const start = (query.page - 1) * query.pageSize;
  return { items: items.slice(start, start + query.pageSize), total: items.length, page: query.page, pageSize: query.pageSize };
}

async function siteNamesOf(sequelize: Sequelize, ids: number[]): Promise<Map<number, string>> {
  if (!ids.length) return new Map();
  const rows = await sequelize.query<{ id: number; name: string }>('SELECT id, name FROM sites WHERE id IN (:ids)', { replacements: { ids: [...new Set(ids)] }, type: QueryTypes.SELECT });
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** What the list's filter form offers: the user's sites and fridges, and the products of lots on them. */
export async function lotFilterOptions(sequelize: Sequelize, user: Express.User): Promise<LotFilterOptions> {
  const replacements = visibleSites(user);
  const sites = await sequelize.query<{ id: number; name: string }>(
    'SELECT id, name FROM sites WHERE (:allSites OR id IN (:siteIds)) ORDER BY name', { replacements, type: QueryTypes.SELECT });
  const fridges = await sequelize.query<{ id: number; code: string; name: string; siteId: number }>(
    'SELECT id, code, name, site_id AS "siteId" FROM fridges WHERE (:allSites OR site_id IN (:siteIds)) ORDER BY code', { replacements, type: QueryTypes.SELECT });
  const products = await sequelize.query<{ id: number; name: string }>(
    `SELECT DISTINCT pr.id, pr.name FROM products pr JOIN presentations p ON p.product_id = pr.id JOIN lots l ON l.presentation_id = p.id
       JOIN stock_movements m ON m.lot_id = l.id JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id)
      WHERE (:allSites OR f.site_id IN (:siteIds)) ORDER BY pr.name`, { replacements, type: QueryTypes.SELECT });
  return { products, sites, fridges };
}
