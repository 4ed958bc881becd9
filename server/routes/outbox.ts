import { Router } from 'express';
import { MessageIdParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { getOutboxMessage, listOutbox } from '../mail/outbox.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';

/** /api/outbox: mail caught by the local SMTP server; each signed-in person reads their own (see mail/outbox.ts). */
export function outboxRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/outbox', requireAuth, async (req, res) => {
    res.json(await listOutbox(ctx, userOf(req)));
  });
  router.get('/outbox/:messageId', requireAuth, validate({ params: MessageIdParams }), async (req, res) => {
    res.json(await getOutboxMessage(ctx, userOf(req), req.params.messageId as string));
  });
  return router;
}
