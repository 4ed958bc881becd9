/**
 * A short in-process cache in front of the PostgreSQL session store. Every signed-in request used to read its
 * session row and write its expiry back (express-session's touch): two round trips before any route ran.
 * Reads are now served from memory for a few seconds, and expiry writes for a session go out at most once a
 * minute (it lives 14 days, so a minute of slack is harmless).
 *
 * Revocation stays immediate in this process: sign-out and session rotation go through destroy()/set() here,
 * and code that deletes sessions by SQL (password change or reset, removal from a team) calls
 * forgetUser(). Another server process on the same database would keep a revoked session for at most READ_TTL_MS.
 */
import type { SessionData, Store } from 'express-session';

export const READ_TTL_MS = 5_000;
export const TOUCH_EVERY_MS = 60_000;
const MAX_ENTRIES = 20_000;

interface Entry {
  /** The session as JSON, parsed afresh for each request so no request shares another's object. */
  json: string;
  userId: string | undefined;
  /** When the row was read or written; served from memory until READ_TTL_MS after that. */
  readAt: number;
  /** When its expiry was last written to the database. */
  writtenAt: number;
  /** The cookie's own expiry (ms since epoch), if it has one. */
  expiresAt: number;
}

type Callback<T = void> = (err?: unknown, value?: T) => void;

/** Wraps a store's get/set/touch/destroy with the cache; the rest of the store is untouched. */
export function cacheSessions<S extends Store>(store: S, now: () => number = Date.now): S & { forgetUser(userId: string): void; forgetAll(): void } {
  const entries = new Map<string, Entry>();
  // Bumped by every revocation, so a database read that was under way meanwhile is not cached.
  let revocations = 0;
  const get = store.get.bind(store);
  const set = store.set.bind(store);
  const destroy = store.destroy.bind(store);
  const touch = store.touch?.bind(store);

  const remember = (sid: string, sess: SessionData, writtenAt: number) => {
    entries.delete(sid);
    if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value!); // oldest first
    const expires = sess.cookie?.expires ? new Date(sess.cookie.expires).getTime() : Infinity;
    const userId = (sess as { passport?: { user?: string } }).passport?.user;
    entries.set(sid, { json: JSON.stringify(sess), userId, readAt: now(), writtenAt, expiresAt: expires });
  };

  store.get = (sid: string, cb: Callback<SessionData | null>) => {
    const hit = entries.get(sid);
    const t = now();
    if (hit && t - hit.readAt < READ_TTL_MS && t < hit.expiresAt) return cb(null, JSON.parse(hit.json) as SessionData);
    const seen = revocations;
    get(sid, (err, sess) => {
      if (err) return cb(err);
      // writtenAt 0 on a first read: the next touch goes out, later ones at most every TOUCH_EVERY_MS.
      if (sess && seen === revocations) remember(sid, sess, hit?.writtenAt ?? 0);
      else entries.delete(sid);
      cb(null, sess ?? null);
    });
  };

  store.set = (sid: string, sess: SessionData, cb?: Callback) => {
    entries.delete(sid);
    set(sid, sess, (err?: unknown) => {
      if (!err) remember(sid, sess, now());
      cb?.(err);
    });
  };

  store.destroy = (sid: string, cb?: Callback) => {
    revocations++;
    entries.delete(sid);
    destroy(sid, (err?: unknown) => {
      entries.delete(sid); // a read that raced the delete may have cached it again
      cb?.(err);
    });
  };

  if (touch) {
    store.touch = (sid: string, sess: SessionData, cb?: Callback) => {
      const hit = entries.get(sid);
      const t = now();
      if (hit && t - hit.writtenAt < TOUCH_EVERY_MS) return cb?.();
      touch(sid, sess, (err?: unknown) => {
        if (!err && hit) hit.writtenAt = t;
        cb?.(err);
      });
    };
  }

  return Object.assign(store, {
    forgetUser(userId: string) {
      revocations++;
      for (const [sid, e] of entries) if (e.userId === userId) entries.delete(sid);
    },
    forgetAll() {
      revocations++;
      entries.clear();
    },
  });
}
