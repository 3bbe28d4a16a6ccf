// The signed-in user's own notifications: newest first with the unread count, and marking them read.
import { QueryTypes } from 'sequelize';
import type { AppContext } from '../app-context.js';
import { AppError } from '../http/app-error.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { Notification } from '../../database/models/index.js';
import { useNotificationMailer } from './notification-mail.js';
import type { NotificationView } from '../../shared/notifications/notification-view.js';

function toView(row: Notification): NotificationView {
  return { id: row.id, kind: row.kind, title: row.title, body: row.body, link: row.link, createdAt: row.createdAt.toISOString(), readAt: row.readAt?.toISOString() ?? null };
}

export function notificationsRoutes(context: AppContext) {
  useNotificationMailer(context.mailer, context.sequelize);
  const router = createSecureRouter('/api/notifications');

  router.get('/', { roles: 'signed-in' }, async (req, res) => {
    const userId = req.user!.id;
    const rows = await Notification.findAll({ where: { userId }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 100 });
    const unread = await Notification.count({ where: { userId, readAt: null } });
    res.json({ items: rows.map(toView), unread });
  });

  router.post('/read-all', { roles: 'signed-in' }, async (req, res) => {
    await context.sequelize.query('UPDATE notifications SET read_at = now() WHERE user_id = :userId AND read_at IS NULL', {
      replacements: { userId: req.user!.id },
      type: QueryTypes.UPDATE,
    });
    res.json({ unread: 0 });
  });

  router.post('/:notificationId/read', { roles: 'signed-in' }, async (req, res) => {
    const userId = req.user!.id;
    // Another user's notification is answered as missing: nobody learns what others were told.
    const row = await Notification.findOne({ where: { id: parseIdParam(req.params.notificationId), userId } });
    if (!row) throw AppError.notFound('No such notification.');
    if (!row.readAt) await row.update({ readAt: new Date() });
    res.json({ notification: toView(row), unread: await Notification.count({ where: { userId, readAt: null } }) });
  });

  return router;
}
