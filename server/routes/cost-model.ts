/** A study's cost-and-power model under /api/studies/:id/cost-model (mounted by the studies router). */
import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { getCostModel, putCostModel } from '../services/cost-model-service.ts';
import { CostModelSchema } from '../../shared/cost/cost-model.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });

export function studyCostModelRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/cost-model', requireAuth, id, async (req, res) => {
    res.json(await getCostModel(ctx, userOf(req), String(req.params.id)));
  });
  router.put('/studies/:id/cost-model', requireRole('engineer'), id, validate({ body: CostModelSchema }), async (req, res) => {
    res.json(await putCostModel(ctx, userOf(req), String(req.params.id), parsed(req, 'body', CostModelSchema)));
  });
  return router;
}
