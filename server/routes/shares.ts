import { Router } from 'express';
import { SharesBody, StudyIdParams } from '../auth/schemas.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { getShares, putShares } from '../services/share-service.ts';

/** /api/studies/:studyId/shares: the owner decides who else reads or edits the study. */
export function sharesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:studyId/shares', requireAuth, validate({ params: StudyIdParams }), async (req, res) => {
    res.json(await getShares(ctx, userOf(req), parsed(req, 'params', StudyIdParams).studyId));
  });
  router.put('/studies/:studyId/shares', requireAuth, validate({ params: StudyIdParams, body: SharesBody }), async (req, res) => {
    res.json(await putShares(ctx, userOf(req), parsed(req, 'params', StudyIdParams).studyId, parsed(req, 'body', SharesBody)));
  });
  return router;
}
