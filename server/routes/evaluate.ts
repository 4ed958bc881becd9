import { Router } from 'express';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignOrListSchema, type Design } from '../../shared/schemas/design.ts';
import { requireAuth } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';

/** POST /api/evaluate: one design or a list, answered with metrics in the same shape and order (signed-in users). */
export function evaluateRouter(): Router {
  const router = Router();
  router.post('/', requireAuth, validate({ body: DesignOrListSchema }), (req, res) => {
    const body = req.body as Design | Design[];
    res.json(Array.isArray(body) ? body.map(evaluateDesign) : evaluateDesign(body));
  });
  return router;
}
