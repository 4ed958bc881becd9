import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { openTestContext } from '../helpers/db.ts';

let ctx: AppContext;
beforeAll(async () => {
  ctx = await openTestContext();
});
afterAll(async () => {
  await ctx.db.destroy();
});

describe('GET /api/health', () => {
  it('answers 200 with a database round-trip against the real PostgreSQL', async () => {
    const res = await request(createApp(ctx)).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.reachable).toBe(true);
    expect(res.body.database.roundTripMs).toBeGreaterThanOrEqual(0);
  });

  it('answers 503 when the database is gone', async () => {
    const { createDataSource } = await import('../../server/data-source.ts');
    const broken = createDataSource('postgresql://nobody:x@127.0.0.1:1/none');
    const res = await request(createApp({ ...ctx, db: broken })).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body.database.reachable).toBe(false);
  });
});

describe('unknown API routes', () => {
  it('are a JSON 404, not the client page', async () => {
    const res = await request(createApp(ctx)).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('not_found');
  });
});
