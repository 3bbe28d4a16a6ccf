// A fridge excursion follows the veterinarian's decisions on the holds it caused: in review once one is decided,
// decided once every hold of every exposure event behind it is. The storage home then stops listing it as undecided,
// and data beside it later opens a follow-up instead of reopening it.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Hold } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { exposureSourceKind } from './exposure-holds.js';

export async function updateExcursionReviewStatus(sequelize: Sequelize, transaction: Transaction, hold: Hold, actorId: number): Promise<void> {
  if (hold.sourceKind !== exposureSourceKind || hold.sourceId === null) return;
  const rows = await sequelize.query<{ id: number; before: string; after: string }>(
    `WITH target AS (
       SELECT e.id, e.status AS before,
              CASE WHEN EXISTS (
                SELECT 1 FROM exposure_events x JOIN holds h ON h.source_kind = :kind AND h.source_id = x.id
                 WHERE x.excursion_id = e.id AND NOT EXISTS (SELECT 1 FROM hold_decisions d WHERE d.hold_id = h.id)
              ) THEN 'in_review' ELSE 'decided' END AS after
         FROM excursions e WHERE e.id = (SELECT excursion_id FROM exposure_events WHERE id = :eventId)
         FOR UPDATE OF e
     )
     UPDATE excursions e SET status = target.after, updated_at = now() FROM target
      WHERE e.id = target.id AND e.status <> target.after
     RETURNING e.id, target.before, target.after`,
    { replacements: { kind: exposureSourceKind, eventId: hold.sourceId }, type: QueryTypes.SELECT, transaction },
  );
  for (const row of rows) {
    await recordAudit({ actorId, action: 'excursion.review_status', entity: 'excursion', entityId: row.id, before: { status: row.before }, after: { status: row.after } }, transaction);
  }
}
