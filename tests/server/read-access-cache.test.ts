/**
 * The short-lived read-access answers (server/services/read-access-cache.ts): kept for ACCESS_TTL_MS, never when
 * `keep` says no or the load refused, not kept when something changed while the load was under way, and all
 * forgotten when a state-changing request ends.
 */
import express from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { ACCESS_TTL_MS, cachedReadAccess, forgetReadAccess, forgetReadAccessAfterWrites } from '../../server/services/read-access-cache.ts';

/** Only the identity of ctx.db matters to the cache: one cache per database. */
const fakeCtx = () => ({ db: {} as DataSource }) as AppContext;

function counter(values: string[] = ['a', 'b', 'c', 'd']) {
  let calls = 0;
  return { load: async () => values[calls++]!, calls: () => calls };
}

afterEach(() => vi.restoreAllMocks());

describe('cachedReadAccess', () => {
  it('serves a kept answer from memory until ACCESS_TTL_MS has passed', async () => {
    let t = 1_000_000;
    vi.spyOn(Date, 'now').mockImplementation(() => t);
    const ctx = fakeCtx();
    const c = counter();
    expect(await cachedReadAccess(ctx, 'k', c.load, () => true)).toBe('a');
    t += ACCESS_TTL_MS - 1;
    expect(await cachedReadAccess(ctx, 'k', c.load, () => true)).toBe('a');
    expect(c.calls()).toBe(1);
    t += 1;
    expect(await cachedReadAccess(ctx, 'k', c.load, () => true)).toBe('b');
    expect(c.calls()).toBe(2);
  });

  it('does not keep what keep() refuses, nor a refusal', async () => {
    const ctx = fakeCtx();
    const c = counter();
    await cachedReadAccess(ctx, 'k', c.load, () => false);
    await cachedReadAccess(ctx, 'k', c.load, () => false);
    expect(c.calls()).toBe(2);
    const refuse = vi.fn(async () => {
      throw new Error('not found');
    });
    await expect(cachedReadAccess(ctx, 'r', refuse, () => true)).rejects.toThrow('not found');
    await expect(cachedReadAccess(ctx, 'r', refuse, () => true)).rejects.toThrow('not found');
    expect(refuse).toHaveBeenCalledTimes(2);
  });

  it('forgets everything for one database only, and does not keep a read that a change overtook', async () => {
    const ctx = fakeCtx();
    const other = fakeCtx();
    const c = counter();
    const o = counter(['x', 'y']);
    await cachedReadAccess(ctx, 'k', c.load, () => true);
    await cachedReadAccess(other, 'k', o.load, () => true);
    forgetReadAccess(ctx.db);
    expect(await cachedReadAccess(ctx, 'k', c.load, () => true)).toBe('b');
    expect(await cachedReadAccess(other, 'k', o.load, () => true)).toBe('x');

    // The load sees the old state, then a change lands before it returns: its answer must not be kept.
    const slow = async () => {
      forgetReadAccess(ctx.db);
      return 'stale';
    };
    expect(await cachedReadAccess(ctx, 's', slow, () => true)).toBe('stale');
    expect(await cachedReadAccess(ctx, 's', c.load, () => true)).toBe('c');
  });
});

describe('forgetReadAccessAfterWrites', () => {
  it('forgets after a POST, PUT or DELETE is answered, not after a GET', async () => {
    const ctx = fakeCtx();
    const app = express();
    app.use(forgetReadAccessAfterWrites(ctx));
    app.all('/x', (_req, res) => res.json({ ok: true }));
    const c = counter();
    const read = () => cachedReadAccess(ctx, 'k', c.load, () => true);
    await read();
    await request(app).get('/x').expect(200);
    await read();
    expect(c.calls()).toBe(1);
    await request(app).post('/x').expect(200);
    await read();
    expect(c.calls()).toBe(2);
    await request(app).put('/x').expect(200);
    await read();
    await request(app).delete('/x').expect(200);
    await read();
    expect(c.calls()).toBe(4);
  });
});
