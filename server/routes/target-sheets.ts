/**
 * A study's target sheets: the list and one sheet under /api/studies/:id/target-sheets, the default (first) sheet
 * under /api/studies/:id/target-sheet, and the presets under /api/target-presets.
 */
import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import {
  createTargetSheet,
  deleteTargetSheet,
  getTargetSheet,
  getTargetSheetById,
  listPresets,
  listTargetSheets,
  putTargetSheet,
  putTargetSheetById,
} from '../services/target-sheet-service.ts';
import { IdParamsSchema, SheetParamsSchema, TargetSheetCreateSchema, TargetSheetPutSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const sheetParams = validate({ params: SheetParamsSchema });

/** The study's default sheet. Mounted by the studies router; mergeParams brings the study's :id. */
export function studyTargetSheetRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/target-sheet', requireAuth, id, async (req, res) => {
    res.json(await getTargetSheet(ctx, userOf(req), String(req.params.id)));
  });
  router.put('/studies/:id/target-sheet', requireRole('engineer'), id, validate({ body: TargetSheetPutSchema }), async (req, res) => {
    res.json(await putTargetSheet(ctx, userOf(req), String(req.params.id), parsed(req, 'body', TargetSheetPutSchema)));
  });
  return router;
}

/** Every sheet of the study. Mounted by the studies router; mergeParams brings the study's :id. */
export function studyTargetSheetsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/studies/:id/target-sheets', requireAuth, id, async (req, res) => {
    res.json(await listTargetSheets(ctx, userOf(req), String(req.params.id)));
  });
  router.post('/studies/:id/target-sheets', requireRole('engineer'), id, validate({ body: TargetSheetCreateSchema }), async (req, res) => {
    res.status(201).json(await createTargetSheet(ctx, userOf(req), String(req.params.id), parsed(req, 'body', TargetSheetCreateSchema)));
  });
  router.get('/studies/:id/target-sheets/:sheetId', requireAuth, sheetParams, async (req, res) => {
    res.json(await getTargetSheetById(ctx, userOf(req), String(req.params.id), String(req.params.sheetId)));
  });
  router.put('/studies/:id/target-sheets/:sheetId', requireRole('engineer'), sheetParams, validate({ body: TargetSheetPutSchema }), async (req, res) => {
    res.json(await putTargetSheetById(ctx, userOf(req), String(req.params.id), String(req.params.sheetId), parsed(req, 'body', TargetSheetPutSchema)));
  });
  router.delete('/studies/:id/target-sheets/:sheetId', requireRole('engineer'), sheetParams, async (req, res) => {
    await deleteTargetSheet(ctx, userOf(req), String(req.params.id), String(req.params.sheetId));
    res.status(204).end();
  });
  return router;
}

export function targetPresetsRouter(): Router {
  const router = Router();
  router.get('/target-presets', requireAuth, (_req, res) => {
    res.json(listPresets());
  });
  return router;
}
