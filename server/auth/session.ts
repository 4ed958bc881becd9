/** express-session stored in PostgreSQL (connect-pg-simple, table `sessions` from our migration). */
import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { AppContext } from '../context.ts';
import { cacheSessions } from './session-cache.ts';
import { forgetReadAccess } from '../services/read-access-cache.ts';
import { forgetUser } from './user-cache.ts';

export const SESSION_COOKIE = 'lobewise.sid';
const SESSION_MAX_AGE_MS = 14 * 24 * 3600 * 1000;

const stores = new WeakMap<AppContext, ReturnType<typeof cacheSessions>>();

/**
 * Call after changing a user (role, name) or deleting their sessions by SQL (password change or reset, removal
 * from a team): the in-process caches of sessions and of the signed-in user then stop serving the old state at once.
 */
export function forgetCachedUser(ctx: AppContext, userId: string): void {
  stores.get(ctx)?.forgetUser(userId);
  forgetUser(ctx, userId);
  forgetReadAccess(ctx.db);
}

export function sessionMiddleware(ctx: AppContext, secret: string): RequestHandler {
  const PgStore = connectPgSimple(session);
  const store = cacheSessions(new PgStore({
    // Through TypeORM's pool, looked up per query, so the app can be built before the DataSource connects.
    pgPromise: { any: (text: string, params?: unknown[]) => ctx.db.query(text, params) },
    tableName: 'sessions',
    createTableIfMissing: false,
    pruneSessionInterval: ctx.config.NODE_ENV === 'test' ? false : 15 * 60,
    errorLog: (...args: unknown[]) => ctx.log.error({ args }, 'session store error'),
  }));
  stores.set(ctx, store);
  return session({
    name: SESSION_COOKIE,
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    // 'auto': Secure when the request came over HTTPS (behind a proxy, with TRUST_PROXY set).
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: SESSION_MAX_AGE_MS, path: '/' },
  });
}
