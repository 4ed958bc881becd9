/** Decisions: history and sign-off under /api/studies/:id/decisions, one decision under /api/decisions/:id. */
import { Router, type Request } from 'express';
import { linkBase } from '../auth/links.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createDecision, deleteDecision, getDecision, listDecisions, patchDecision, previewDecision } from '../services/decision-service.ts';
import { DecisionCheckSchema, DecisionCreateSchema, DecisionPatchSchema } from '../../shared/schemas/review.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function decisionsRouter(ctx: AppContext): Router {
  const router = Router();
  const reviewer = requireRole('reviewer');
  router.get('/studies/:id/decisions', requireAuth, id, async (req, res) => {
    res.json(await listDecisions(ctx, userOf(req), idOf(req)));
  });
  router.post('/studies/:id/decisions', requireAuth, reviewer, id, validate({ body: DecisionCreateSchema }), async (req, res) => {
    res.status(201).json(await createDecision(ctx, userOf(req), idOf(req), parsed(req, 'body', DecisionCreateSchema), linkBase(ctx.config, req)));
  });
  // Writes nothing: the sign-off dialog shows the design, its figures and the limits it fails before anyone signs.
  router.post('/studies/:id/decisions/check', requireAuth, reviewer, id, validate({ body: DecisionCheckSchema }), async (req, res) => {
    res.json(await previewDecision(ctx, userOf(req), idOf(req), parsed(req, 'body', DecisionCheckSchema)));
  });
  router.get('/decisions/:id', requireAuth, id, async (req, res) => {
    res.json(await getDecision(ctx, userOf(req), idOf(req)));
  });
  // No role gate here: a signed decision answers 409 to everyone; the service then limits drafts to their author.
  router.patch('/decisions/:id', requireAuth, id, validate({ body: DecisionPatchSchema }), async (req, res) => {
    res.json(await patchDecision(ctx, userOf(req), idOf(req), parsed(req, 'body', DecisionPatchSchema), linkBase(ctx.config, req)));
  });
  router.delete('/decisions/:id', requireAuth, id, async (req, res) => {
    await deleteDecision(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
