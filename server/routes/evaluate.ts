import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { DesignSchema, MAX_DESIGNS_PER_CALL } from '../../shared/schemas/design.ts';
import { heavyRequest, workSignal } from '../middleware/heavy-request.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsedOneOrMany, validateOneOrMany } from '../middleware/validate-one-or-many.ts';
import { evaluateDesigns } from '../services/evaluate-service.ts';

/**
 * POST /api/evaluate: one design or a list, answered with metrics in the same shape and order (signed-in users).
 * Validated a slice at a time and evaluated on the worker pool, so a large list never holds the event loop.
 */
export function evaluateRouter(ctx: AppContext): Router {
  const router = Router();
  const body = validateOneOrMany(DesignSchema, {
    max: MAX_DESIGNS_PER_CALL,
    tooFew: 'must hold at least one design',
    tooMany: `must hold at most ${MAX_DESIGNS_PER_CALL} designs`,
  });
  router.post('/evaluate', requireAuth, heavyRequest(ctx), body, async (req, res) => {
    const json = await evaluateDesigns(ctx, userOf(req), parsedOneOrMany(req, DesignSchema), workSignal(req));
    res.type('application/json').send(json);
  });
  return router;
}
