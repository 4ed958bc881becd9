/** The /api router: one line per resource. */
import { Router } from 'express';
import type { AppContext } from '../context.ts';
import { NotFound } from '../errors.ts';
import { evaluateRouter } from './evaluate.ts';
import { healthRouter } from './health.ts';
import { accountRouter } from './account.ts';
import { authRouter } from './auth.ts';
import { invitationsRouter } from './invitations.ts';
import { meRouter } from './me.ts';
import { outboxRouter } from './outbox.ts';
import { sharesRouter } from './shares.ts';
import { teamRouter } from './team.ts';
import { candidatesRouter } from './candidates.ts';
import { devicesRouter } from './devices.ts';
import { studiesRouter } from './studies.ts';
import { sweepsRouter } from './sweeps.ts';
import { targetPresetsRouter } from './target-sheets.ts';
import { reviewRouter } from './review.ts';
import { benchRouter } from './bench.ts';
import { rangeDataRouter } from './range-data.ts';
import { elementPatternsRouter } from './element-patterns.ts';
import { coverageRouter } from './coverage.ts';

export function apiRouter(ctx: AppContext): Router {
  const api = Router();
  api.use('/health', healthRouter(ctx));
  api.use('/evaluate', evaluateRouter(ctx));
  api.use('/auth', authRouter(ctx));
  api.use('/me', meRouter(ctx));
  api.use('/account', accountRouter(ctx));
  api.use('/team', teamRouter(ctx));
  api.use('/invitations', invitationsRouter(ctx));
  api.use('/outbox', outboxRouter(ctx));
  api.use('/studies/:studyId/shares', sharesRouter(ctx));
  api.use('/studies', studiesRouter(ctx));
  api.use('/candidates', candidatesRouter(ctx));
  api.use('/devices', devicesRouter(ctx));
  api.use(sweepsRouter(ctx));
  api.use('/target-presets', targetPresetsRouter());
  api.use(reviewRouter(ctx));
  api.use(benchRouter(ctx));
  api.use(rangeDataRouter(ctx));
  api.use(elementPatternsRouter(ctx));
  api.use('/coverage', coverageRouter(ctx));
  // Anything else under /api is a JSON 404, never the client's index.html.
  api.use((req, _res, next) => next(NotFound(`route ${req.method} ${req.baseUrl}${req.path}`)));
  return api;
}
