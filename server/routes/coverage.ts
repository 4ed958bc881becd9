import { Router } from 'express';
import { CoverageRequestSchema, type CoverageInput } from '../../shared/schemas/coverage.ts';
import type { AppContext } from '../context.ts';
import { coverageQueueFull, runCoverageTask } from '../coverage/coverage-pool.ts';
import { ApiError } from '../errors.ts';
import { requireAuth, userOf } from '../middleware/require-auth.ts';
import { parsed, validate } from '../middleware/validate.ts';
import { resolveElementPatterns } from '../services/element-pattern-service.ts';

/**
 * POST /api/coverage: a device's modules, region and percentiles; the coverage result, computed on a worker
 * thread. Table elements named by id are filled from the patterns of the studies the caller may read.
 */
export function coverageRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/coverage', requireAuth, validate({ body: CoverageRequestSchema }), async (req, res) => {
    const body = parsed(req, 'body', CoverageRequestSchema);
    const designs = await resolveElementPatterns(ctx, { user: userOf(req) }, body.modules.map((m) => m.design), (i) => `modules[${i}].design.element.patternId`);
    const input: CoverageInput = { ...body, modules: body.modules.map((m, i) => ({ ...m, design: designs[i]! })) };
    if (coverageQueueFull()) throw new ApiError(503, 'busy', 'coverage: too many computations waiting; try again shortly');
    // A client that goes away stops its computation.
    const abort = new AbortController();
    res.on('close', () => {
      if (!res.writableEnded) abort.abort();
    });
    try {
      res.json(await runCoverageTask(input, abort.signal));
    } catch (err) {
      if (!abort.signal.aborted) throw err;
    }
  });
  return router;
}
