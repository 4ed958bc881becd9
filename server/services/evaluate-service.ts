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
import { resolveElementPatterns } from './element-pattern-service.ts';
import type { Design } from '../../shared/schemas/design.ts';

/** The metrics as JSON text, in the body's shape and order (built on the worker thread). */
export async function evaluateDesigns(ctx: AppContext, user: AuthUser, body: Design | Design[], signal?: AbortSignal): Promise<string> {
  const list = Array.isArray(body);
  checkWorkBudget(ctx, (list ? body : [body]).reduce((sum, d) => sum + patternWork(d), 0), 'body');
  // Table elements name a stored pattern: fill in its values from any study the caller may read.
  const designs = await resolveElementPatterns(ctx, { user }, list ? body : [body], (i) => (list ? `[${i}].element.patternId` : 'element.patternId'));
  return runRequestTask<string>({ kind: 'evaluate', designs, single: !Array.isArray(body) }, { threads: ctx.config.SWEEP_THREADS, signal });
}
