/**
 * Trade-table pages of finished sweeps, kept as the JSON they were sent as. A finished sweep's stored results
 * change only when its study's cost model is saved (its designs are re-priced and the sweep's cost_model_version
 * set), so a page is keyed by what it asked for and by the sweep's state: status, points written, the cost model
 * version its figures use and the study's current one. Any change to those makes a new key; the old entries age
 * out of the bounded map. The scan-window recomputation and the JSON building then run once per page, not once
 * per request.
 *
 * Access is checked on every request (`sweepStateFor`): the same rule as findStudyFor (team, visibility, share),
 * with the sweep's state read in the same round trip, and for a finished sweep the answer is kept a few seconds by
 * read-access-cache.ts, which forgets it at once on any change made through this process.
 */
import { createHash } from 'node:crypto';
import type { Response } from 'express';
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import type { ShareAccess } from '../entities/study-share.ts';
import type { StudyVisibility } from '../entities/study.ts';
import { NotFound } from '../errors.ts';
import { cachedReadAccess } from './read-access-cache.ts';
import { canRead } from './study-access.ts';

const MAX_PAGES = 300;

export interface SweepState {
  id: string;
  status: string;
  pointsDone: number;
  costModelVersion: number | null;
  currentCostVersion: number | null;
}

/** The sweep's state if `user` may read its study; NotFound('sweep') otherwise (ids never reveal what exists). */
export function sweepStateFor(ctx: AppContext, user: AuthUser, sweepId: string): Promise<SweepState> {
  // The role is in the key because it is part of the rule; only a finished sweep's state stays still long enough.
  const key = `sweep\u0000${user.id}\u0000${user.teamId}\u0000${user.role}\u0000${sweepId}`;
  return cachedReadAccess(ctx, key, () => readSweepState(ctx, user, sweepId), (state) => state.status === 'done');
}

async function readSweepState(ctx: AppContext, user: AuthUser, sweepId: string): Promise<SweepState> {
  const [row] = (await ctx.db.query(
    `SELECT s.id, s.status, s.points_done AS "pointsDone", s.cost_model_version AS "costModelVersion",
       c.version AS "currentCostVersion", st.team_id AS "teamId", st.owner_id AS "ownerId", st.visibility, sh.access
     FROM sweeps s
     JOIN studies st ON st.id = s.study_id AND st.team_id = $2
     LEFT JOIN study_shares sh ON sh.study_id = st.id AND sh.user_id = $3
     LEFT JOIN study_cost_models c ON c.study_id = st.id
     WHERE s.id = $1`,
    [sweepId, user.teamId, user.id],
  )) as (SweepState & { teamId: string; ownerId: string; visibility: StudyVisibility; access: ShareAccess | null })[];
  if (!row || !canRead(user, row, row.access)) throw NotFound('sweep');
  return { id: row.id, status: row.status, pointsDone: row.pointsDone, costModelVersion: row.costModelVersion, currentCostVersion: row.currentCostVersion };
}

/** A page as sent: the JSON bytes and their entity tag (computed once, not hashed again per request). */
export interface CachedPage {
  body: Buffer;
  etag: string;
}

const pages = new Map<string, CachedPage>();
/** Builds under way, so clients asking for the same new page at once share one build. */
const building = new Map<string, Promise<CachedPage>>();

/** Only finished sweeps are kept: a running one changes with every chunk written. */
export function pageKey(kind: string, state: SweepState, query: string): string | null {
  if (state.status !== 'done') return null;
  return `${kind}\u0000${state.id}\u0000${state.pointsDone}\u0000${state.costModelVersion}\u0000${state.currentCostVersion}\u0000${query}`;
}

function pageOf(value: unknown): CachedPage {
  const body = Buffer.from(JSON.stringify(value));
  // A weak tag of the length and a SHA-1 of the bytes, in the form Express itself would send.
  const etag = `W/"${body.length.toString(16)}-${createHash('sha1').update(body).digest('base64').slice(0, 27)}"`;
  return { body, etag };
}

/** The page from the cache, or from `build` (then kept, the oldest entry making room). */
export async function cachedPage(key: string | null, build: () => Promise<unknown>): Promise<CachedPage> {
  if (key === null) return pageOf(await build());
  const hit = pages.get(key);
  if (hit) return hit;
  let pending = building.get(key);
  if (!pending) {
    pending = build().then(pageOf);
    building.set(key, pending);
    pending.then(
      (page) => {
        building.delete(key);
        if (pages.size >= MAX_PAGES) pages.delete(pages.keys().next().value!);
        pages.set(key, page);
      },
      () => building.delete(key),
    );
  }
  return pending;
}

/** Sends a page as JSON with its entity tag (Express answers 304 when the browser already has it). */
export function sendPage(res: Response, page: CachedPage): void {
  res.set('ETag', page.etag).type('json').send(page.body);
}
