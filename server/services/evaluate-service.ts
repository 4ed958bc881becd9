/**
 * POST /api/evaluate's work: one design or a list, evaluated on the request worker pool within the per-request
 * work budget. Designs arrive validated; anything that must be filled in on the server before the engine runs
 * (stored element patterns, say) belongs between the budget check and the pool call.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { runRequestTask } from '../compute/request-pool.ts';
import { checkWorkBudget } from '../middleware/heavy-request.ts';
import { patternWork } from '../../shared/compute/pattern-work.ts';
import type { Design } from '../../shared/schemas/design.ts';

/** The metrics as JSON text, in the body's shape and order (built on the worker thread). */
export async function evaluateDesigns(ctx: AppContext, _user: AuthUser, body: Design | Design[], signal?: AbortSignal): Promise<string> {
  const designs = Array.isArray(body) ? body : [body];
  checkWorkBudget(ctx, designs.reduce((sum, d) => sum + patternWork(d), 0), 'body');
  return runRequestTask<string>({ kind: 'evaluate', designs, single: !Array.isArray(body) }, { threads: ctx.config.SWEEP_THREADS, signal });
}
