/** Candidates: the list and create under /api/studies/:id/candidates, one candidate under /api/candidates/:id. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createCandidate, deleteCandidate, getCandidate, listCandidates, patchCandidate } from '../services/candidate-service.ts';
import { CandidateCreateSchema, CandidatePatchSchema, IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** Mounted by the studies router; mergeParams brings the study's :id. */
export function studyCandidatesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/candidates', requireAuth, id, async (req, res) => {
    res.json(await listCandidates(ctx, userOf(req), idOf(req)));
  });
  router.post('/studies/:id/candidates', requireRole('engineer'), id, validate({ body: CandidateCreateSchema }), async (req, res) => {
    res.status(201).json(await createCandidate(ctx, userOf(req), idOf(req), parsed(req, 'body', CandidateCreateSchema)));
  });
  return router;
}

export function candidatesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/candidates/:id', requireAuth, id, async (req, res) => {
    res.json(await getCandidate(ctx, userOf(req), idOf(req)));
  });
  router.patch('/candidates/:id', requireRole('engineer'), id, validate({ body: CandidatePatchSchema }), async (req, res) => {
    res.json(await patchCandidate(ctx, userOf(req), idOf(req), parsed(req, 'body', CandidatePatchSchema)));
  });
  router.delete('/candidates/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteCandidate(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
