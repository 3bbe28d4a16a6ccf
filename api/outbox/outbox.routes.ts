// Admins read what the fake mail server caught (development and demo only: a real relay keeps no outbox).
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { listOutbox, readAttachment, readMessage } from './outbox-service.js';

export function outboxRoutes(context: AppContext) {
  const router = createSecureRouter('/api/outbox');
  const admin = { roles: ['admin'] } as const;
  const folder = context.config.MAIL_CAPTURE_DIR;

  router.get('/', admin, async (_req, res) => {
    res.json({ items: await listOutbox(folder) });
  });

  router.get('/:id', admin, async (req, res) => {
    res.json(await readMessage(folder, String(req.params.id)));
  });

  router.get('/:id/attachments/:index', admin, async (req, res) => {
    const index = Number(req.params.index);
    const attachment = await readAttachment(folder, String(req.params.id), Number.isInteger(index) ? index : -1);
    res.type(attachment.contentType).attachment(attachment.filename).send(attachment.content);
  });

  return router;
}
