/**
 * Sweeps: start one in a study, list a study's sweeps, follow progress (JSON or server-sent events),
 * cancel, and read results (points, design rows, CSV).
 */
import { Router, type Request } from 'express';
import { DesignsQuerySchema, PointsQuerySchema, SteerSpanQuerySchema } from '../../shared/sweep/results-query.ts';
import { SweepIdParamsSchema, SweepRequestSchema } from '../../shared/sweep/request.ts';
import type { AppContext } from '../context.ts';
import { eventStreamSlot, streamProgress } from '../sweeps/progress-stream.ts';
import { requireAuth, requireRole, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { listDesigns, listPoints, steerSpan, writePointsCsv } from '../services/sweep-results.ts';
import { cachedPage, pageKey, sendPage, sweepStateFor } from '../services/sweep-page-cache.ts';
import { cancelSweep, createSweep, findSweepFor, getSweep, listSweeps } from '../services/sweep-service.ts';

const id = validate({ params: SweepIdParamsSchema });
const idOf = (req: Request) => String(req.params.id);

export function sweepsRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/studies/:id/sweeps', requireRole('engineer'), id, validate({ body: SweepRequestSchema }), async (req, res) => {
    res.status(201).json(await createSweep(ctx, userOf(req), idOf(req), parsed(req, 'body', SweepRequestSchema)));
  });
  router.get('/studies/:id/sweeps', requireAuth, id, async (req, res) => {
    res.json(await listSweeps(ctx, userOf(req), idOf(req)));
  });
  router.get('/sweeps/:id', requireAuth, id, async (req, res) => {
    res.json(await getSweep(ctx, userOf(req), idOf(req)));
  });
  router.get('/sweeps/:id/events', requireAuth, eventStreamSlot(ctx), id, (req, res) => streamProgress(ctx, req, res));
  router.post('/sweeps/:id/cancel', requireRole('engineer'), id, async (req, res) => {
    res.json(await cancelSweep(ctx, userOf(req), idOf(req)));
  });
  // Pages of a finished sweep come from the page cache (access checked on every request; see sweep-page-cache.ts).
  router.get('/sweeps/:id/results', requireAuth, id, validate({ query: PointsQuerySchema }), async (req, res) => {
    const query = parsed(req, 'query', PointsQuerySchema);
    const state = await sweepStateFor(ctx, userOf(req), idOf(req));
    const page = await cachedPage(pageKey('points', state, JSON.stringify(query)), async () =>
      listPoints(ctx, await findSweepFor(ctx, userOf(req), idOf(req), 'read'), query),
    );
    sendPage(res, page);
  });
  router.get('/sweeps/:id/designs', requireAuth, id, validate({ query: DesignsQuerySchema }), async (req, res) => {
    const query = parsed(req, 'query', DesignsQuerySchema);
    const state = await sweepStateFor(ctx, userOf(req), idOf(req));
    const page = await cachedPage(pageKey('designs', state, JSON.stringify(query)), async () =>
      listDesigns(ctx, await findSweepFor(ctx, userOf(req), idOf(req), 'read'), query),
    );
    sendPage(res, page);
  });
  router.get('/sweeps/:id/steer-span', requireAuth, id, validate({ query: SteerSpanQuerySchema }), async (req, res) => {
    res.json(await steerSpan(ctx, await findSweepFor(ctx, userOf(req), idOf(req), 'read')));
  });
  router.get('/sweeps/:id/results.csv', requireAuth, id, async (req, res) => {
    const sweep = await findSweepFor(ctx, userOf(req), idOf(req), 'read');
    const file = `${sweep.name.replace(/[^\w.-]+/g, '-').slice(0, 80) || 'sweep'}.csv`;
    res.writeHead(200, { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${file}"` });
    await writePointsCsv(ctx, sweep, res);
    res.end();
  });
  return router;
}
