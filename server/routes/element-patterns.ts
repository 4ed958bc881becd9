/** Element patterns: upload and list under a study; one pattern, its raw file, delete by id. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { singleUpload } from '../bench/upload.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import {
  createElementPattern,
  deleteElementPattern,
  getElementPattern,
  listElementPatterns,
  rawElementPattern,
} from '../services/element-pattern-service.ts';
import { ElementPatternUploadSchema } from '../../shared/schemas/element-pattern.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function elementPatternsRouter(ctx: AppContext): Router {
  const router = Router();
  const upload = singleUpload(ctx.config.UPLOAD_LIMIT_BYTES);

  router.post('/studies/:id/element-patterns', requireRole('engineer'), id, upload, validate({ body: ElementPatternUploadSchema }), async (req, res) => {
    const body = parsed(req, 'body', ElementPatternUploadSchema);
    res.status(201).json(await createElementPattern(ctx, userOf(req), idOf(req), body.name, req.file));
  });
  router.get('/studies/:id/element-patterns', requireAuth, id, async (req, res) => {
    res.json(await listElementPatterns(ctx, userOf(req), idOf(req)));
  });
  router.get('/element-patterns/:id', requireAuth, id, async (req, res) => {
    res.json(await getElementPattern(ctx, userOf(req), idOf(req)));
  });
  router.get('/element-patterns/:id/raw', requireAuth, id, async (req, res) => {
    const { filename, bytes } = await rawElementPattern(ctx, userOf(req), idOf(req));
    res.type('text/csv').attachment(filename).send(bytes);
  });
  router.delete('/element-patterns/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteElementPattern(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
