/**
 * Review and sign-off: review requests and the study's review state here, plus the comments, decisions and
 * packet routers, mounted together at /api with one line in routes/index.ts.
 */
import { Router, type Request } from 'express';
import { linkBase } from '../auth/links.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { searchDesigns } from '../services/design-search.ts';
import { answerReviewRequest, getStudyReview, requestReview, waitingFor } from '../services/review-request-service.ts';
import { DesignSearchQuerySchema, ReviewAnswerSchema, ReviewRequestCreateSchema } from '../../shared/schemas/review.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';
import { commentsRouter } from './comments.ts';
import { decisionsRouter } from './decisions.ts';
import { packetRouter } from './packet.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function reviewRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/review', requireAuth, id, async (req, res) => {
    res.json(await getStudyReview(ctx, userOf(req), idOf(req)));
  });
  router.post('/studies/:id/review-requests', requireRole('engineer'), id, validate({ body: ReviewRequestCreateSchema }), async (req, res) => {
    const body = parsed(req, 'body', ReviewRequestCreateSchema);
    res.status(201).json(await requestReview(ctx, userOf(req), idOf(req), body, linkBase(ctx.config, req)));
  });
  // The signed-in member's open requests (the studies page's "waiting for me" list and the header's count).
  router.get('/review-requests/waiting', requireAuth, async (req, res) => {
    res.json(await waitingFor(ctx, userOf(req)));
  });
  // Every design of the study a reviewer can sign off: candidates and all designs of its finished sweeps.
  router.get('/studies/:id/design-search', requireAuth, id, validate({ query: DesignSearchQuerySchema }), async (req, res) => {
    res.json(await searchDesigns(ctx, userOf(req), idOf(req), parsed(req, 'query', DesignSearchQuerySchema)));
  });
  router.post('/review-requests/:id/answer', requireRole('reviewer'), id, validate({ body: ReviewAnswerSchema }), async (req, res) => {
    res.json(await answerReviewRequest(ctx, userOf(req), idOf(req), parsed(req, 'body', ReviewAnswerSchema), linkBase(ctx.config, req)));
  });
  router.use(commentsRouter(ctx));
  router.use(decisionsRouter(ctx));
  router.use(packetRouter(ctx));
  return router;
}
