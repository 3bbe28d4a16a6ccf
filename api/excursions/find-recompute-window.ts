// Widens the time span an import touched until it holds every stored excursion, gap and fill it meets.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

interface Span {
  start: number;
  end: number;
}

const iso = (ms: number) => new Date(ms).toISOString();

/**
 * From the file's first to last reading, out to the fridge's readings just before and after (so a gap
 * between two files is seen), then to the ends of every stored record that overlaps, until nothing more
 * overlaps. Records are then recomputed as a whole, never cut at the window's edge.
 */
export async function findRecomputeWindow(sequelize: Sequelize, transaction: Transaction, fridgeId: number, loggerIds: readonly number[], span: Span): Promise<Span> {
  const [neighbours] = await sequelize.query<{ before: Date | null; after: Date | null }>(
    `SELECT
       (SELECT max(p.at) FROM unnest(ARRAY[:ids]::int[]) AS l(id)
          CROSS JOIN LATERAL (SELECT at FROM readings WHERE logger_id = l.id AND at < :start ORDER BY at DESC LIMIT 1) p) AS before,
       (SELECT min(n.at) FROM unnest(ARRAY[:ids]::int[]) AS l(id)
          CROSS JOIN LATERAL (SELECT at FROM readings WHERE logger_id = l.id AND at > :end ORDER BY at LIMIT 1) n) AS after`,
    { replacements: { ids: [...loggerIds, 0], start: iso(span.start), end: iso(span.end) }, type: QueryTypes.SELECT, transaction },
  );
  let window: Span = {
    start: neighbours?.before ? Math.min(span.start, new Date(neighbours.before).getTime()) : span.start,
    end: neighbours?.after ? Math.max(span.end, new Date(neighbours.after).getTime()) : span.end,
  };
  for (let round = 0; round < 50; round++) {
    const [reach] = await sequelize.query<{ start: Date | null; end: Date | null }>(
      `SELECT min(starts_at) AS start, max(ends_at) AS end FROM (
         SELECT starts_at, ends_at FROM excursions WHERE fridge_id = :fridgeId AND source = 'readings' AND starts_at <= :end AND ends_at >= :start
         UNION ALL SELECT starts_at, ends_at FROM fridge_gaps WHERE fridge_id = :fridgeId AND starts_at <= :end AND ends_at >= :start
         UNION ALL SELECT starts_at, ends_at FROM backup_fills WHERE fridge_id = :fridgeId AND starts_at <= :end AND ends_at >= :start
       ) records`,
      { replacements: { fridgeId, start: iso(window.start), end: iso(window.end) }, type: QueryTypes.SELECT, transaction },
    );
    const next = {
      start: reach?.start ? Math.min(window.start, new Date(reach.start).getTime()) : window.start,
      end: reach?.end ? Math.max(window.end, new Date(reach.end).getTime()) : window.end,
    };
    if (next.start === window.start && next.end === window.end) break;
    window = next;
  }
  return window;
}
