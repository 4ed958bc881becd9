/** A study's target sheet under /api/studies/:id/target-sheet, and the presets under /api/target-presets. */
import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';
import { getTargetSheet, listPresets, putTargetSheet } from '../services/target-sheet-service.ts';
import { IdParamsSchema, TargetSheetPutSchema, type TargetSheetPut } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });

/** Mounted by the studies router; mergeParams brings the study's :id. */
export function studyTargetSheetRouter(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });
  router.get('/', requireAuth, id, async (req, res) => {
    res.json(await getTargetSheet(ctx, req.user!, String(req.params.id)));
  });
  router.put('/', requireRole('engineer'), id, validate({ body: TargetSheetPutSchema }), async (req, res) => {
    res.json(await putTargetSheet(ctx, req.user!, String(req.params.id), req.body as TargetSheetPut));
  });
  return router;
}

export function targetPresetsRouter(): Router {
  const router = Router();
  router.get('/', requireAuth, (_req, res) => {
    res.json(listPresets());
  });
  return router;
}
