/**
 * Short-lived answers to "may this user read this finished sweep, and in what state is it?", for the trade-table
 * pages that a room of people page through. Without it each page request made one access query even when the page
 * itself came from memory.
 *
 * Revocation stays immediate in this process: every state-changing API request (POST, PUT, PATCH, DELETE), once
 * answered or abandoned, forgets every answer (`forgetReadAccess`), and so do the in-process jobs that change a
 * finished sweep (re-pricing) and every change to a user (forgetCachedUser). An answer is also forgotten after
 * ACCESS_TTL_MS, the bound for a change made by another server process, as for the session cache. Refusals are
 * never kept, and a read that was under way while something changed is not kept either.
 */
import type { NextFunction, Request, Response } from 'express';
import type { DataSource } from 'typeorm';
import type { AppContext } from '../context.ts';

export const ACCESS_TTL_MS = 5_000;
const MAX_ENTRIES = 20_000;
const SAFE_METHODS: ReadonlySet<string> = new Set(['GET', 'HEAD', 'OPTIONS']);

interface Cache {
  entries: Map<string, { value: unknown; at: number }>;
  generation: number;
}

/** One cache per database (per app), so jobs that hold only the DataSource can forget too. */
const caches = new WeakMap<DataSource, Cache>();

function cacheOf(db: DataSource): Cache {
  let c = caches.get(db);
  if (!c) caches.set(db, (c = { entries: new Map(), generation: 0 }));
  return c;
}

/**
 * `load()`'s answer for `key`, from memory when it was read less than ACCESS_TTL_MS ago and nothing has changed
 * since; `keep(value)` says whether this answer may be kept at all (a running sweep's state may not).
 */
export async function cachedReadAccess<T>(ctx: AppContext, key: string, load: () => Promise<T>, keep: (value: T) => boolean): Promise<T> {
  const cache = cacheOf(ctx.db);
  const hit = cache.entries.get(key);
  if (hit && Date.now() - hit.at < ACCESS_TTL_MS) return hit.value as T;
  const generation = cache.generation;
  const value = await load(); // a refusal throws and is not kept
  if (cache.generation === generation && keep(value)) {
    cache.entries.delete(key);
    if (cache.entries.size >= MAX_ENTRIES) cache.entries.delete(cache.entries.keys().next().value!);
    cache.entries.set(key, { value, at: Date.now() });
  }
  return value;
}

/** Something that may change who can read what, or a finished sweep's state, happened: forget every answer. */
export function forgetReadAccess(db: DataSource): void {
  const cache = cacheOf(db);
  cache.generation += 1;
  cache.entries.clear();
}

/**
 * Forgets every answer when a state-changing request ends (answered, or its client gone), after its handler's
 * writes. Kept blunt on purpose: a list of "the routes that change access" would be one more thing to forget.
 */
export function forgetReadAccessAfterWrites(ctx: AppContext) {
  return (req: Request, res: Response, next: NextFunction): void => {
    if (!SAFE_METHODS.has(req.method)) {
      const forget = () => forgetReadAccess(ctx.db);
      res.once('finish', forget);
      res.once('close', forget);
    }
    next();
  };
}
