/** The /api router: one line per resource. */
import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { NotFound } from '../errors.ts';
import { evaluateRouter } from './evaluate.ts';
import { healthRouter } from './health.ts';

export function apiRouter(ctx: AppContext): Router {
  const api = Router();
  api.use('/health', healthRouter(ctx));
  api.use('/evaluate', evaluateRouter());
  // Anything else under /api is a JSON 404, never the client's index.html.
  api.use((req, _res, next) => next(NotFound(`route ${req.method} ${req.baseUrl}${req.path}`)));
  return api;
}
