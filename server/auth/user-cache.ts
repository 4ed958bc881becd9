/**
 * The signed-in user as passport's deserializeUser finds it, kept READ_TTL_MS per app, beside the session cache:
 * every signed-in request looked the user up again. Anything that changes a user's role, name or sessions calls
 * forgetCachedUser() (server/auth/session.ts), so in this process a change shows on the next request.
 */
import type { AppContext } from '../context.ts';
import { READ_TTL_MS } from './session-cache.ts';
import type { AuthUser } from './types.ts';

const MAX_USERS = 20_000;
const caches = new WeakMap<AppContext, Map<string, { user: AuthUser | null; at: number; generation: number }>>();
const generations = new WeakMap<AppContext, number>();

function cacheOf(ctx: AppContext) {
  let c = caches.get(ctx);
  if (!c) caches.set(ctx, (c = new Map()));
  return c;
}

/** The user by id, from memory when read less than READ_TTL_MS ago; `load` otherwise. */
export async function cachedUser(ctx: AppContext, id: string, load: () => Promise<AuthUser | null>): Promise<AuthUser | null> {
  const cache = cacheOf(ctx);
  const hit = cache.get(id);
  if (hit && Date.now() - hit.at < READ_TTL_MS) return hit.user && { ...hit.user };
  const generation = generations.get(ctx) ?? 0;
  const user = await load();
  // A change that landed while this read was under way must not be hidden behind what the read saw.
  if ((generations.get(ctx) ?? 0) === generation) {
    if (cache.size >= MAX_USERS) cache.delete(cache.keys().next().value!);
    cache.set(id, { user: user && { ...user }, at: Date.now(), generation });
  }
  return user;
}

export function forgetUser(ctx: AppContext, id: string): void {
  generations.set(ctx, (generations.get(ctx) ?? 0) + 1);
  caches.get(ctx)?.delete(id);
}
