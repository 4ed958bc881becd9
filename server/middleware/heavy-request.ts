/**
 * Guards for request-sized computations, for any route that runs work on a worker pool:
 *
 *   router.post('/x', requireAuth, heavyRequest(ctx), validate(...), async (req, res) => {
 *     checkWorkBudget(ctx, patternWork(design, n), 'points');
 *     res.json(await runRequestTask(task, { signal: workSignal(req) }));
 *   });
 *
 * heavyRequest caps the heavy requests one user has open at once (HEAVY_REQUESTS_PER_USER; more answer 429 with
 * Retry-After) and gives the request an AbortSignal that fires when the client goes away before the answer
 * is sent, so pool work for nobody stops. checkWorkBudget refuses a request whose estimated work (element·samples)
 * exceeds REQUEST_WORK_BUDGET with a 413 naming the field that sets its size.
 */
import type { Request, RequestHandler } from 'express';
import type { AppContext } from '../context.ts';
import { ApiError } from '../errors.ts';
import { userSlots } from './user-slots.ts';

/** Seconds a refused client is asked to wait: heavy requests are sized to finish within seconds. */
export const HEAVY_RETRY_AFTER_SECONDS = 2;

const signals = new WeakMap<Request, AbortSignal>();

export function heavyRequest(ctx: AppContext): RequestHandler {
  const slot = userSlots(ctx, {
    kind: 'heavy',
    limit: (c) => c.HEAVY_REQUESTS_PER_USER,
    code: 'too_many_heavy_requests',
    what: 'heavy requests',
    retryAfterSeconds: HEAVY_RETRY_AFTER_SECONDS,
  });
  return (req, res, next) =>
    slot(req, res, (err?: unknown) => {
      if (err) return next(err);
      const controller = new AbortController();
      signals.set(req, controller.signal);
      // 'close' comes after the answer is sent, or when the connection drops first: only the latter aborts.
      res.once('close', () => {
        if (!res.writableFinished) controller.abort(new Error('client went away'));
      });
      next();
    });
}

/** The request's abort signal (set by heavyRequest); a never-aborting one on routes without it. */
export function workSignal(req: Request): AbortSignal {
  return signals.get(req) ?? new AbortController().signal;
}

/** 413 naming `field` when `work` (element·samples) exceeds the configured per-request budget. */
export function checkWorkBudget(ctx: AppContext, work: number, field: string): void {
  const budget = ctx.config.REQUEST_WORK_BUDGET;
  if (work <= budget) return;
  const message = `asks for ${work.toExponential(2)} element·samples of work; one request may ask for at most ${budget.toExponential(2)} (fewer designs, beams, points or trials, or a smaller array)`;
  throw new ApiError(413, 'too_much_work', `${field}: ${message}`, [{ field, message }]);
}
