import { Router } from 'express';
import { requireRole } from '../auth/session';
import { AppError } from '../http/app-error';
import type { OutboxRepository } from './outbox.repository';
import type { MailMessage } from './mail-message.entity';

function view(m: MailMessage) {
  return {
    id: m.id,
    from: m.from,
    to: m.to,
    subject: m.subject,
    text: m.text,
    html: m.html,
    sizeBytes: m.sizeBytes,
    receivedAt: new Date(m.receivedAt).toISOString(),
  };
}
export type OutboxMessageView = ReturnType<typeof view>;

/** GET /api/outbox: what the embedded SMTP server received (admin, sales). */
export function outboxRouter(outbox: OutboxRepository): Router {
  const router = Router();
  router.use(requireRole('admin', 'sales'));
  router.get('/', async (_req, res) => {
    res.json({ items: (await outbox.list(200)).map(view) });
  });
  router.get('/:id', async (req, res) => {
    const message = await outbox.findById(req.params.id as string);
    if (!message) throw AppError.notFound('There is no such message.');
    res.json({ message: view(message) });
  });
  return router;
}
