import { Router } from 'express';
import type { AppContext } from '../context.ts';

/** Liveness plus a database round-trip, so a monitor sees a broken database as a broken service. */
export function healthRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const started = process.hrtime.bigint();
    try {
      await ctx.db.query('SELECT 1');
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      res.json({ status: 'ok', database: { reachable: true, roundTripMs: Math.round(ms * 100) / 100 } });
    } catch (err) {
      ctx.log.warn({ err }, 'health check: database unreachable');
      res.status(503).json({ status: 'degraded', database: { reachable: false } });
    }
  });
  return router;
}
