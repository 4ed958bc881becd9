import { Router } from 'express';
import { CoverageRequestSchema, type CoverageInput } from '../../shared/schemas/coverage.ts';
import { coverageQueueFull, runCoverageTask } from '../coverage/coverage-pool.ts';
import { ApiError } from '../errors.ts';
import { requireAuth } from '../middleware/require-auth.ts';
import { validate } from '../middleware/validate.ts';

/** POST /api/coverage: a device's modules, region and percentiles; the coverage result, computed on a worker thread. */
export function coverageRouter(): Router {
  const router = Router();
  router.post('/', requireAuth, validate({ body: CoverageRequestSchema }), async (req, res) => {
    if (coverageQueueFull()) throw new ApiError(503, 'busy', 'coverage: too many computations waiting; try again shortly');
    // A client that goes away stops its computation.
    const abort = new AbortController();
    res.on('close', () => {
      if (!res.writableEnded) abort.abort();
    });
    try {
      res.json(await runCoverageTask(req.body as CoverageInput, abort.signal));
    } catch (err) {
      if (!abort.signal.aborted) throw err;
    }
  });
  return router;
}
