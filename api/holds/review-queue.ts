// The veterinarian's queue: every hold with no decision yet, grouped by the event behind it (an arrival, an excursion...).
import { QueryTypes, type Sequelize } from 'sequelize';
import type { QueueEvent } from '../../shared/lots/review-queue.js';
import { addEventDetails } from './queue-event-details.js';

interface Row {
  hold_id: number;
  lot_id: number;
  lot_number: string;
  expiry: string;
  product: string;
  doses_per_vial: number;
  vials: number;
  site_id: number;
  time_zone: string | null;
  cause: string;
  source_kind: string;
  source_id: number | null;
  reason: string;
  opened_at: Date;
}

export async function reviewQueue(sequelize: Sequelize, user: Express.User): Promise<QueueEvent[]> {
  const rows = await sequelize.query<Row>(
    `SELECT h.id AS hold_id, l.id AS lot_id, l.lot_number, l.expiry::text AS expiry, pr.name AS product, p.doses_per_vial,
            coalesce((SELECT sum(b.vials) FROM stock_balances b WHERE b.lot_id = l.id), 0)::int AS vials,
            first_site.site_id, first_site.time_zone,
            h.cause, h.source_kind, h.source_id, h.reason, h.opened_at
       FROM holds h JOIN lots l ON l.id = h.lot_id JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
       LEFT JOIN LATERAL (
         SELECT f.site_id, s.time_zone FROM stock_movements m JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id) JOIN sites s ON s.id = f.site_id
          WHERE m.lot_id = l.id ORDER BY m.at, m.id LIMIT 1
       ) first_site ON true
      WHERE NOT EXISTS (SELECT 1 FROM hold_decisions d WHERE d.hold_id = h.id)
      ORDER BY h.opened_at, h.id`,
    { type: QueryTypes.SELECT },
  );
  const events = new Map<string, QueueEvent>();
  for (const row of rows) {
    if (!user.allSites && !user.siteIds.includes(row.site_id)) continue;
    const key = `${row.cause}:${row.source_kind}:${row.source_id}`;
    const event = events.get(key) ?? {
      cause: row.cause, sourceKind: row.source_kind, sourceId: row.source_id, openedAt: row.opened_at.toISOString(), lots: [], vials: 0, doses: 0,
      title: '', severe: false, timeZone: row.time_zone, exposureEvent: null, troubleshooting: null, recall: null,
    };
    // Lots of one event on several sites (a recall) have no one site's clock.
    if (event.lots.length && event.lots.some((lot) => lot.siteId !== row.site_id)) event.timeZone = null;
    const doses = row.vials * row.doses_per_vial;
    event.lots.push({
      holdId: row.hold_id, lotId: row.lot_id, lotNumber: row.lot_number, expiry: row.expiry, product: row.product,
      dosesPerVial: row.doses_per_vial, vials: row.vials, doses, siteId: row.site_id, reason: row.reason, openedAt: row.opened_at.toISOString(),
    });
    event.vials += row.vials;
    event.doses += doses;
    events.set(key, event);
  }
  const details: QueueEvent[] = [];
  for (const event of events.values()) details.push(await addEventDetails(sequelize, event));
  return details;
}
