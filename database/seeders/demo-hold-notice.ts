// Tells of a demo hold the way `openHold` does (the notification to the lot's veterinarians, storage staff and admins),
// dated when the hold opened: the notifications page shows each one's time, and a seeded hold opened days ago.
import { QueryTypes, type Transaction } from 'sequelize';
import { holdEventKey, notifyHoldOpened } from '../../api/notifications/hold-notifications.js';
import type { HoldCause } from '../../shared/lots/hold-causes.js';
import { Hold } from '../models/index.js';

export async function noticeHoldOpened(
  transaction: Transaction,
  hold: { lotId: number; cause: HoldCause; sourceKind: string; sourceId: number | null; reason: string; openedAt: Date },
): Promise<void> {
  await notifyHoldOpened(transaction, hold);
  await Hold.sequelize!.query(`UPDATE notifications SET created_at = :at WHERE kind = 'hold_opened' AND event_key = :key`, {
    replacements: { at: hold.openedAt, key: holdEventKey(hold) },
    type: QueryTypes.UPDATE,
    transaction,
  });
}
