// In-app notifications about holds, one per event and user, written in the hold's own transaction; their e-mail
// copies go out after that transaction commits (a failed send never undoes the hold).
import { QueryTypes, type Transaction } from 'sequelize';
import { holdCauseLabels, type HoldCause } from '../../shared/lots/hold-causes.js';
import { holdDecisionLabels, type HoldDecisionKind } from '../../shared/lots/lot-status.js';
import { Hold } from '../../database/models/index.js';
import { afterCommitSendMail } from './notification-mail.js';

interface LotFacts {
  lot_number: string;
  product: string;
}

/** Veterinarians, storage staff and admins who see any site the lot's vials have been on. */
async function recipientsForLot(lotId: number, transaction: Transaction): Promise<number[]> {
  const rows = await Hold.sequelize!.query<{ id: number }>(
    `SELECT u.id FROM users u
      WHERE u.active AND u.roles && ARRAY['veterinarian', 'storage', 'admin']::text[]
        AND (u.all_sites OR EXISTS (
          SELECT 1 FROM user_sites us JOIN fridges f ON f.site_id = us.site_id
            JOIN stock_movements m ON f.id IN (m.to_fridge_id, m.from_fridge_id)
           WHERE us.user_id = u.id AND m.lot_id = :lotId))
      ORDER BY u.id`,
    { replacements: { lotId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((row) => row.id);
}

async function lotFacts(lotId: number, transaction: Transaction): Promise<LotFacts> {
  const [row] = await Hold.sequelize!.query<LotFacts>(
    `SELECT l.lot_number, pr.name AS product FROM lots l JOIN presentations p ON p.id = l.presentation_id
       JOIN products pr ON pr.id = p.product_id WHERE l.id = :lotId`,
    { replacements: { lotId }, type: QueryTypes.SELECT, transaction },
  );
  return row ?? { lot_number: String(lotId), product: '' };
}

/** The key of the event a hold belongs to, the same as the review queue's grouping. */
export function holdEventKey(hold: { cause: string; sourceKind: string; sourceId: number | null }): string {
  return `${hold.cause}:${hold.sourceKind}:${hold.sourceId ?? ''}`;
}

async function upsertForUsers(
  transaction: Transaction,
  userIds: number[],
  note: { kind: 'hold_opened' | 'hold_decided'; eventKey: string; title: string; line: string; link: string },
): Promise<void> {
  if (!userIds.length) return;
  // A second lot of the same event adds a line to the one notification rather than a notification of its own,
  // and makes it unread again: there is news in it.
  await Hold.sequelize!.query(
    `INSERT INTO notifications (user_id, kind, event_key, title, body, link)
     SELECT u, :kind, :eventKey, :title, :line, :link FROM unnest(ARRAY[:userIds]::int[]) AS u
     ON CONFLICT (user_id, kind, event_key) DO UPDATE SET body = notifications.body || E'\\n' || EXCLUDED.body, read_at = NULL`,
    { replacements: { ...note, userIds }, type: QueryTypes.INSERT, transaction },
  );
  afterCommitSendMail(transaction);
}

export async function notifyHoldOpened(
  transaction: Transaction,
  hold: { lotId: number; cause: HoldCause; sourceKind: string; sourceId: number | null; reason: string },
): Promise<void> {
  const facts = await lotFacts(hold.lotId, transaction);
  const severe = hold.cause === 'freeze' ? ' (severe: possible freezing)' : '';
  await upsertForUsers(transaction, await recipientsForLot(hold.lotId, transaction), {
    kind: 'hold_opened',
    eventKey: holdEventKey(hold),
    title: `Lots held "do not use": ${holdCauseLabels[hold.cause].toLowerCase()}${severe}`,
    line: `Lot ${facts.lot_number}, ${facts.product}${hold.reason ? `: ${hold.reason}` : ''}`,
    link: '/review',
  });
}

export async function notifyHoldDecided(
  transaction: Transaction,
  hold: { id: number; lotId: number; cause: HoldCause },
  decision: { id: number; decision: HoldDecisionKind; condition: string; signerName: string },
): Promise<void> {
  const facts = await lotFacts(hold.lotId, transaction);
  const condition = decision.condition ? ` (${decision.condition})` : '';
  await upsertForUsers(transaction, await recipientsForLot(hold.lotId, transaction), {
    kind: 'hold_decided',
    eventKey: `decision:${decision.id}`,
    title: `Lot ${facts.lot_number}: ${holdDecisionLabels[decision.decision].toLowerCase()}`,
    line: `${holdDecisionLabels[decision.decision]}${condition} of lot ${facts.lot_number}, ${facts.product} (${holdCauseLabels[hold.cause].toLowerCase()} hold), signed by ${decision.signerName}.`,
    link: `/review`,
  });
}
