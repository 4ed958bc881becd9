/** The /api router: every resource router, each declaring its full paths. */
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
import { candidatesRouter, studyCandidatesRouter } from './candidates.ts';
import { studyCostModelRouter } from './cost-model.ts';
import { devicesRouter, studyDevicesRouter } from './devices.ts';
import { studiesRouter } from './studies.ts';
import { sweepsRouter } from './sweeps.ts';
import { studyTargetSheetRouter, studyTargetSheetsRouter, targetPresetsRouter } from './target-sheets.ts';
import { reviewRouter } from './review.ts';
import { benchRouter } from './bench.ts';
import { rangeDataRouter } from './range-data.ts';
import { elementPatternsRouter } from './element-patterns.ts';
import { coverageRouter } from './coverage.ts';

export function apiRouter(ctx: AppContext): Router {
  const api = Router();
  // Every router declares its full paths under /api, so each route line reads as the URL it serves.
  for (const router of [
    healthRouter(ctx), evaluateRouter(ctx), authRouter(ctx), meRouter(ctx), accountRouter(ctx), teamRouter(ctx),
    invitationsRouter(ctx), outboxRouter(ctx), sharesRouter(ctx), studiesRouter(ctx), studyCandidatesRouter(ctx),
    studyCostModelRouter(ctx), studyTargetSheetRouter(ctx), studyTargetSheetsRouter(ctx), studyDevicesRouter(ctx),
    candidatesRouter(ctx), devicesRouter(ctx), sweepsRouter(ctx), targetPresetsRouter(), reviewRouter(ctx),
    benchRouter(ctx), rangeDataRouter(ctx), elementPatternsRouter(ctx), coverageRouter(ctx),
  ]) api.use(router);
  // Anything else under /api is a JSON 404, never the client's index.html.
  api.use((req, _res, next) => next(NotFound(`route ${req.method} ${req.baseUrl}${req.path}`)));
  return api;
}
