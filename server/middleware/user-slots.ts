/**
 * A cap on how many requests of one kind a user may have open at once (heavy computations, event streams).
 * A request over the cap answers 429 with Retry-After; a slot is given back when the response closes, whether
 * it finished or the client went away. Counts live per app context and per kind, shared by every route using it.
 */
import type { RequestHandler } from 'express';
import type { Config } from '../config.ts';
import type { AppContext } from '../context.ts';
import { ApiError } from '../errors.ts';
import { userOf } from './require-auth.ts';

const openByContext = new WeakMap<AppContext, Map<string, number>>();

export interface SlotRule {
  /** Name of the kind, part of the count key ('heavy', 'events'). */
  kind: string;
  limit: (config: Config) => number;
  /** Error code and the words for what is limited ("heavy requests"). */
  code: string;
  what: string;
  retryAfterSeconds: number;
}

export function userSlots(ctx: AppContext, rule: SlotRule): RequestHandler {
  let open = openByContext.get(ctx);
  if (!open) openByContext.set(ctx, (open = new Map()));
  const counts = open;
  return (req, res, next) => {
    const key = `${rule.kind}:${userOf(req).id}`;
    const limit = rule.limit(ctx.config);
    const now = counts.get(key) ?? 0;
    if (now >= limit) {
      res.setHeader('Retry-After', String(rule.retryAfterSeconds));
      return next(new ApiError(429, rule.code, `at most ${limit} ${rule.what} per user at once; retry after ${rule.retryAfterSeconds} s`));
    }
    counts.set(key, now + 1);
    res.once('close', () => {
      const left = (counts.get(key) ?? 1) - 1;
      if (left > 0) counts.set(key, left);
      else counts.delete(key);
    });
    next();
  };
}
