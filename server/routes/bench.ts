/** Bench codes, calibration, manual codes, beam squint and error tolerance, all under /api/candidates/:id. */
import { Router, type Request, type RequestHandler } from 'express';
import type { AppContext } from '../context.ts';
import { singleUpload } from '../bench/upload.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { heavyRequest, workSignal } from '../middleware/heavy-request.ts';
import { parsed, validate } from '../middleware/validate.ts';
import {
  calibrationFromFile,
  codesCsvFor,
  codesFor,
  getCalibration,
  manualCodes,
  monteCarloFor,
  putCalibration,
  squintFor,
} from '../services/bench-service.ts';
import {
  CalibrationPutSchema,
  CodesCsvQuerySchema,
  CodesRequestSchema,
  ManualCodesRequestSchema,
  SquintRequestSchema,
} from '../../shared/bench/api-schemas.ts';
import { MonteCarloOptionsSchema } from '../../shared/bench/monte-carlo-schema.ts';
import { IdParamsSchema } from '../../shared/schemas/study.ts';

const id = validate({ params: IdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

/** A CSV file upload skips the JSON body check; the service parses the file instead. */
const unlessFile =
  (check: RequestHandler): RequestHandler =>
  (req, res, next) =>
    req.file ? next() : check(req, res, next);

export function benchRouter(ctx: AppContext): Router {
  const router = Router();
  const upload = singleUpload(ctx.config.UPLOAD_LIMIT_BYTES);
  // Bench maths runs on the worker pool: per-user cap, work budget, cancelled when the client leaves.
  const heavy = heavyRequest(ctx);

  router.post('/candidates/:id/codes', requireAuth, heavy, id, validate({ body: CodesRequestSchema }), async (req, res) => {
    res.json(await codesFor(ctx, userOf(req), idOf(req), parsed(req, 'body', CodesRequestSchema), workSignal(req)));
  });
  router.get('/candidates/:id/codes.csv', requireAuth, heavy, id, validate({ query: CodesCsvQuerySchema }), async (req, res) => {
    const { csv, filename } = await codesCsvFor(ctx, userOf(req), idOf(req), parsed(req, 'query', CodesCsvQuerySchema), workSignal(req));
    res.type('text/csv').attachment(filename).send(csv);
  });
  router.get('/candidates/:id/calibration', requireAuth, id, async (req, res) => {
    res.json(await getCalibration(ctx, userOf(req), idOf(req)));
  });
  router.put('/candidates/:id/calibration', requireRole('engineer'), id, upload, unlessFile(validate({ body: CalibrationPutSchema })), async (req, res) => {
    const offsets = req.file ? calibrationFromFile(req.file.buffer) : parsed(req, 'body', CalibrationPutSchema).offsets;
    res.json(await putCalibration(ctx, userOf(req), idOf(req), offsets, req.file?.originalname ?? null));
  });
  router.post('/candidates/:id/manual-codes', requireAuth, heavy, id, validate({ body: ManualCodesRequestSchema }), async (req, res) => {
    res.json(await manualCodes(ctx, userOf(req), idOf(req), parsed(req, 'body', ManualCodesRequestSchema), workSignal(req)));
  });
  router.post('/candidates/:id/squint', requireAuth, heavy, id, validate({ body: SquintRequestSchema }), async (req, res) => {
    res.json(await squintFor(ctx, userOf(req), idOf(req), parsed(req, 'body', SquintRequestSchema), workSignal(req)));
  });
  router.post('/candidates/:id/monte-carlo', requireAuth, heavy, id, validate({ body: MonteCarloOptionsSchema }), async (req, res) => {
    res.json(await monteCarloFor(ctx, userOf(req), idOf(req), parsed(req, 'body', MonteCarloOptionsSchema), workSignal(req)));
  });
  return router;
}
