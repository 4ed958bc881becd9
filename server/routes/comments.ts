/** Comments: the thread under /api/studies/:id/comments, one comment (to reopen its view) under /api/comments/:id. */
import { Router, type Request } from 'express';
import { linkBase } from '../auth/links.ts';
import type { AppContext } from '../context.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createComment, getComment, listComments } from '../services/comment-service.ts';
import { CommentCreateSchema } from '../../shared/schemas/review.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function commentsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/comments', requireAuth, id, async (req, res) => {
    res.json(await listComments(ctx, userOf(req), idOf(req)));
  });
  router.post('/studies/:id/comments', requireAuth, id, validate({ body: CommentCreateSchema }), async (req, res) => {
    res.status(201).json(await createComment(ctx, userOf(req), idOf(req), parsed(req, 'body', CommentCreateSchema), linkBase(ctx.config, req)));
  });
  router.get('/comments/:id', requireAuth, id, async (req, res) => {
    res.json(await getComment(ctx, userOf(req), idOf(req)));
  });
  return router;
}
