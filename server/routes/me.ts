import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { meOf } from '../services/me-service.ts';

/** GET /api/me: the signed-in user, their team and role. */
export function meRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/me', requireAuth, async (req, res) => {
    res.json(await meOf(ctx, userOf(req)));
  });
  return router;
}
