/**
 * The in-process session cache (server/auth/session-cache.ts) over express-session's own MemoryStore, counting
 * what reaches the store underneath: reads are served from memory for READ_TTL_MS, expiry writes go out at most
 * every TOUCH_EVERY_MS, and destroy() or forgetUser() revoke at once.
 */
import session, { type SessionData } from 'express-session';
import { describe, expect, it } from 'vitest';
import { cacheSessions, READ_TTL_MS, TOUCH_EVERY_MS } from '../../server/auth/session-cache.ts';

function setup() {
  const inner = new session.MemoryStore();
  const calls = { get: 0, touch: 0 };
  const get = inner.get.bind(inner);
  const touch = inner.touch.bind(inner);
  inner.get = (sid, cb) => {
    calls.get++;
    get(sid, cb);
  };
  inner.touch = (sid, sess, cb) => {
    calls.touch++;
    touch(sid, sess, cb);
  };
  // The cache wraps the store's own methods, so keep the plain delete to act as SQL underneath would.
  const rawDestroy = inner.destroy.bind(inner);
  let t = 1_000_000;
  const clock = { advance: (ms: number) => (t += ms) };
  const store = cacheSessions(inner, () => t);
  const p = <T>(f: (cb: (err?: unknown, v?: T) => void) => void) => new Promise<T | undefined>((res, rej) => f((e, v) => (e ? rej(e) : res(v))));
  const read = (sid: string) => p<SessionData | null>((cb) => store.get(sid, cb));
  const write = (sid: string, userId: string) =>
    p<void>((cb) => store.set(sid, { cookie: { originalMaxAge: null }, passport: { user: userId } } as unknown as SessionData, cb));
  const touchIt = (sid: string) => p<void>((cb) => store.touch!(sid, { cookie: { originalMaxAge: null } } as unknown as SessionData, cb));
  const destroy = (sid: string) => p<void>((cb) => store.destroy(sid, cb));
  return { rawDestroy, store, calls, clock, read, write, touchIt, destroy };
}

describe('session cache', () => {
  it('serves repeated reads from memory until the read TTL passes, each read a fresh object', async () => {
    const s = setup();
    await s.write('a', 'u1');
    s.store.forgetAll(); // as after a restart: the first read goes to the store
    const first = await s.read('a');
    const second = await s.read('a');
    expect(s.calls.get).toBe(1);
    expect(second).toEqual(first);
    expect(second).not.toBe(first);
    s.clock.advance(READ_TTL_MS + 1);
    await s.read('a');
    expect(s.calls.get).toBe(2);
  });

  it('writes the expiry on the first touch, then at most once per TOUCH_EVERY_MS', async () => {
    const s = setup();
    await s.write('a', 'u1');
    s.store.forgetAll();
    await s.read('a');
    await s.touchIt('a');
    await s.touchIt('a');
    expect(s.calls.touch).toBe(1);
    s.clock.advance(TOUCH_EVERY_MS + 1);
    await s.read('a');
    await s.touchIt('a');
    expect(s.calls.touch).toBe(2);
  });

  it('forgets a destroyed session at once, and every session of a user on forgetUser', async () => {
    const s = setup();
    await s.write('a', 'u1');
    await s.write('b', 'u1');
    await s.write('c', 'u2');
    await s.read('a');
    await s.destroy('a');
    expect(await s.read('a')).toBeFalsy();
    // Deleted underneath by SQL, as a password reset does; the cache must not keep serving them.
    await new Promise<void>((res) => s.rawDestroy('b', () => res()));
    await new Promise<void>((res) => s.rawDestroy('c', () => res()));
    s.store.forgetUser('u1');
    expect(await s.read('b')).toBeFalsy();
    // u2 was not forgotten, so its cached copy still serves within the TTL: the reason callers must forget.
    expect(await s.read('c')).toBeTruthy();
  });
});
