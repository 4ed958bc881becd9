/** Range data: upload under a candidate, list under a study, one upload (and its raw file) by id. */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { singleUpload } from '../bench/upload.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { createRangeUpload, deleteRangeUpload, getRangeUpload, listRangeUploads, rawRangeUpload } from '../services/range-data-service.ts';
import { RangeUploadFieldsSchema } from '../../shared/bench/api-schemas.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function rangeDataRouter(ctx: AppContext): Router {
  const router = Router();
  const upload = singleUpload(ctx.config.UPLOAD_LIMIT_BYTES);

  router.post('/candidates/:id/range-data', requireRole('engineer'), id, upload, validate({ body: RangeUploadFieldsSchema }), async (req, res) => {
    res.status(201).json(await createRangeUpload(ctx, userOf(req), idOf(req), parsed(req, 'body', RangeUploadFieldsSchema), req.file));
  });
  router.get('/studies/:id/range-data', requireAuth, id, async (req, res) => {
    res.json(await listRangeUploads(ctx, userOf(req), idOf(req)));
  });
  router.get('/range-data/:id', requireAuth, id, async (req, res) => {
    res.json(await getRangeUpload(ctx, userOf(req), idOf(req)));
  });
  router.get('/range-data/:id/raw', requireAuth, id, async (req, res) => {
    const { filename, bytes } = await rawRangeUpload(ctx, userOf(req), idOf(req));
    res.type('text/csv').attachment(filename).send(bytes);
  });
  router.delete('/range-data/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteRangeUpload(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  return router;
}
