// Sends the e-mail copies of pending notifications, one message per event to everyone it concerns, after the commit.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Mailer } from '../mail/mailer.js';

let delivery: { mailer: Mailer; sequelize: Sequelize } | undefined;
const hooked = new WeakSet<Transaction>();

/** The app registers its mailer once; holds opened outside a running app (a CLI) keep their mail pending. */
export function useNotificationMailer(mailer: Mailer, sequelize: Sequelize): void {
  delivery = { mailer, sequelize };
}

export function afterCommitSendMail(transaction: Transaction): void {
  if (hooked.has(transaction)) return;
  hooked.add(transaction);
  transaction.afterCommit(async () => {
    try {
      await sendPendingNotificationMail();
    } catch {
      // The holds and notifications are committed; a mail that could not go stays pending or failed.
    }
  });
}

interface Claimed {
  id: number;
  kind: string;
  event_key: string;
  title: string;
  body: string;
  email: string;
}

/** Claims every pending copy (so two senders never send one twice), sends one message per event, records the outcome. */
export async function sendPendingNotificationMail(): Promise<number> {
  if (!delivery) return 0;
  const { mailer, sequelize } = delivery;
  const claimed = await sequelize.query<Claimed>(
    `WITH c AS (UPDATE notifications SET mail_state = 'sending' WHERE mail_state = 'pending' RETURNING id, user_id, kind, event_key, title, body)
     SELECT c.id, c.kind, c.event_key, c.title, c.body, u.email FROM c JOIN users u ON u.id = c.user_id ORDER BY c.id`,
    { type: QueryTypes.SELECT },
  );
  const groups = new Map<string, Claimed[]>();
  for (const row of claimed) groups.set(`${row.kind}|${row.event_key}`, [...(groups.get(`${row.kind}|${row.event_key}`) ?? []), row]);
  let sent = 0;
  for (const rows of groups.values()) {
    const ok = await mailer.send({
      to: rows.map((r) => r.email),
      subject: rows[0].title,
      text: [rows[0].body, '', 'Open Vialyard\'s review page to see the chart, the exposure and the troubleshooting record.',
        'Held vials stay in proper storage until the veterinarian decides; the product label and local rules apply.'].join('\n'),
    }).catch(() => false);
    if (ok) sent++;
    await sequelize.query(`UPDATE notifications SET mail_state = :state WHERE id IN (:ids)`, {
      replacements: { state: ok ? 'sent' : 'failed', ids: rows.map((r) => r.id) },
      type: QueryTypes.UPDATE,
    });
  }
  return sent;
}
