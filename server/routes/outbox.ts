import { Router } from 'express';
import { MessageIdParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { getOutboxMessage, listOutbox } from '../mail/outbox.ts';
import { requireRole, userOf } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';

/** /api/outbox: mail caught by the local SMTP server, for the team's admins. */
export function outboxRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireRole('admin'), async (req, res) => {
    res.json(await listOutbox(ctx, userOf(req)));
  });
  router.get('/:messageId', requireRole('admin'), validate({ params: MessageIdParams }), async (req, res) => {
    res.json(await getOutboxMessage(ctx, userOf(req), req.params.messageId as string));
  });
  return router;
}
