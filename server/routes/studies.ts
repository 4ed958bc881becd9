/**
 * /api/studies: the studies list, one study, duplicate, export/import, and the study's candidates and target sheet.
 * Writes check the engineer role first, so a reviewer hears 403 whatever the body; team and sharing are checked by the service.
 */
import { Router, type Request } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import {
  createStudy,
  deleteStudy,
  duplicateStudy,
  exportStudy,
  getStudy,
  importStudy,
  listStudies,
  patchStudy,
} from '../services/study-service.ts';
import {
  IdParamsSchema,
  StudyCreateSchema,
  StudyExportSchema,
  StudyListQuerySchema,
  StudyPatchSchema,
} from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** A file name safe in a Content-Disposition header, from the study's name. */
function exportFileName(name: string): string {
  const safe = name.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'study';
  return `${safe}.lobewise.json`;
}

export function studiesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies', requireAuth, validate({ query: StudyListQuerySchema }), async (req, res) => {
    res.json(await listStudies(ctx, userOf(req), parsed(req, 'query', StudyListQuerySchema)));
  });
  router.post('/studies', requireRole('engineer'), validate({ body: StudyCreateSchema }), async (req, res) => {
    res.status(201).json(await createStudy(ctx, userOf(req), parsed(req, 'body', StudyCreateSchema)));
  });
  router.post('/studies/import', requireRole('engineer'), validate({ body: StudyExportSchema }), async (req, res) => {
    res.status(201).json(await importStudy(ctx, userOf(req), parsed(req, 'body', StudyExportSchema)));
  });
  router.get('/studies/:id', requireAuth, id, async (req, res) => {
    res.json(await getStudy(ctx, userOf(req), idOf(req)));
  });
  router.patch('/studies/:id', requireRole('engineer'), id, validate({ body: StudyPatchSchema }), async (req, res) => {
    res.json(await patchStudy(ctx, userOf(req), idOf(req), parsed(req, 'body', StudyPatchSchema)));
  });
  router.delete('/studies/:id', requireRole('engineer'), id, async (req, res) => {
    await deleteStudy(ctx, userOf(req), idOf(req));
    res.status(204).end();
  });
  router.post('/studies/:id/duplicate', requireRole('engineer'), id, async (req, res) => {
    res.status(201).json(await duplicateStudy(ctx, userOf(req), idOf(req)));
  });
  router.get('/studies/:id/export', requireAuth, id, async (req, res) => {
    const file = await exportStudy(ctx, userOf(req), idOf(req));
    res.attachment(exportFileName(file.study.name)).json(file);
  });
  return router;
}
