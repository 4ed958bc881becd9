/**
 * GET /api/sweeps/:id/events: a sweep's progress as server-sent events. Who is asking is checked again on
 * every tick (the member still exists, their role and the study's shares still let them read it); when that
 * stops being true the stream says `event: gone` and closes. Streams per user are capped (eventStreamSlot).
 */
import type { Request, RequestHandler, Response } from 'express';
import type { AppContext } from '../context.ts';
import { FINISHED_STATUSES } from '../entities/sweep.ts';
import { ApiError } from '../errors.ts';
import { userOf } from '../middleware/require-auth.ts';
import { userSlots } from '../middleware/user-slots.ts';
import { getSweep, type SweepProgress } from '../services/sweep-service.ts';
import { findAuthUser } from '../services/user-service.ts';

/** How often the stream re-reads progress (and re-checks access), and how often it sends a keep-alive comment. */
const EVENT_POLL_MS = 500;
const KEEPALIVE_MS = 15_000;

/** At most EVENT_STREAMS_PER_USER open streams per user; more answer 429 with Retry-After. */
export function eventStreamSlot(ctx: AppContext): RequestHandler {
  return userSlots(ctx, { kind: 'events', limit: (c) => c.EVENT_STREAMS_PER_USER, code: 'too_many_streams', what: 'progress streams', retryAfterSeconds: 5 });
}

/** The progress as the asking user may still see it now, or null when they no longer may (or it is gone). */
async function progressNow(ctx: AppContext, userId: string, sweepId: string): Promise<SweepProgress | null> {
  const user = await findAuthUser(ctx, userId);
  if (!user) return null;
  try {
    return await getSweep(ctx, user, sweepId);
  } catch (err) {
    if (err instanceof ApiError && (err.status === 403 || err.status === 404)) return null;
    throw err;
  }
}

export async function streamProgress(ctx: AppContext, req: Request, res: Response): Promise<void> {
  const userId = userOf(req).id;
  const sweepId = String(req.params.id);
  const first = await getSweep(ctx, userOf(req), sweepId);
  res.writeHead(200, { 'content-type': 'text/event-stream', 'cache-control': 'no-cache', connection: 'keep-alive', 'x-accel-buffering': 'no' });
  let last = '';
  let lastSent = Date.now();
  let closed = false;
  res.on('close', () => {
    closed = true;
  });
  let p: SweepProgress | null = first;
  while (!closed && p) {
    const text = JSON.stringify(p);
    if (text !== last) {
      res.write(`event: progress\ndata: ${text}\n\n`);
      last = text;
      lastSent = Date.now();
    } else if (Date.now() - lastSent > KEEPALIVE_MS) {
      res.write(': keep-alive\n\n');
      lastSent = Date.now();
    }
    if (FINISHED_STATUSES.has(p.status)) break;
    await new Promise((r) => setTimeout(r, EVENT_POLL_MS));
    if (closed) return;
    try {
      p = await progressNow(ctx, userId, sweepId);
    } catch (err) {
      ctx.log.warn({ err, sweepId }, 'progress stream: could not re-read the sweep');
      break;
    }
    if (!p) {
      res.write('event: gone\ndata: {"reason":"this sweep is no longer visible to you"}\n\n');
      res.end();
      return;
    }
  }
  if (!closed) {
    res.write('event: end\ndata: {}\n\n');
    res.end();
  }
}
