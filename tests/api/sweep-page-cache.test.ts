/**
 * Trade-table pages of a finished sweep are served from the page cache (server/services/sweep-page-cache.ts):
 * access is checked on every request (kept a few seconds by read-access-cache.ts, forgotten at once by any change
 * made through the app), and a page reflects what the sweep's stored results are now.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { ACCESS_TTL_MS } from '../../server/services/read-access-cache.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let runner: SweepRunner;
let app: Express;
let owner: AuthedClient;
let teammate: AuthedClient;
let teammateId: string;
let outsider: AuthedClient;
let studyId: string;
let sweepId: string;

/** Two designs (nx 4 and 8), three steering angles each. */
const GRID = { frequencyGHz: 28, nx: [4, 8], dxMm: 5.35, steerAzDeg: [0, 15, 30] };

beforeAll(async () => {
  ctx = await openTestContext({ SWEEP_POINT_LIMIT: '5000' });
  await truncateAll(ctx.db);
  runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 1, embedded: true, recoverEverySeconds: 1 });
  ctx.sweeps = runner;
  app = createApp(ctx);
  const team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  owner = await authed(app, team.engineer);
  teammate = await authed(app, team.admin);
  teammateId = team.admin.id;
  outsider = await authed(app, other.engineer);
  studyId = (await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Cached pages' })).id;
  const res = await owner.post(`/api/studies/${studyId}/sweeps`).send({ name: 'small', grid: GRID });
  expect(res.status).toBe(201);
  sweepId = res.body.id;
  const deadline = Date.now() + 60_000;
  while ((await owner.get(`/api/sweeps/${sweepId}`)).body.status !== 'done') {
    if (Date.now() > deadline) throw new Error('sweep did not finish');
    await new Promise((r) => setTimeout(r, 200));
  }
}, 120_000);

afterAll(async () => {
  await runner?.stop();
  await ctx?.db.destroy();
});

describe('cached trade-table pages', () => {
  it('serve the same page twice, and still answer 404 to another team once a page is cached', async () => {
    const url = `/api/sweeps/${sweepId}/designs?sort=nx:desc&limit=10`;
    const first = await owner.get(url);
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(2);
    expect(first.body.rows.map((r: { nx: number }) => r.nx)).toEqual([8, 4]);
    const again = await owner.get(url);
    expect(again.headers['content-type']).toMatch(/^application\/json/);
    expect(again.body).toEqual(first.body);
    expect(again.headers.etag).toBe(first.headers.etag);
    expect((await owner.get(url).set('if-none-match', first.headers.etag as string)).status).toBe(304);
    expect((await outsider.get(url)).status).toBe(404);
    const points = `/api/sweeps/${sweepId}/results?limit=10`;
    expect((await owner.get(points)).body.total).toBe(6);
    expect((await outsider.get(points)).status).toBe(404);
    expect((await outsider.get(points)).body.error.code).toBe('not_found');
  });

  it('stop at once for a teammate when the owner makes the study private, and again when a share is removed', async () => {
    const url = `/api/sweeps/${sweepId}/designs?limit=10`;
    const shares = `/api/studies/${studyId}/shares`;
    expect((await teammate.get(url)).status).toBe(200);
    expect((await teammate.get(url)).status).toBe(200); // now answered from the read-access cache
    expect((await owner.put(shares).send({ visibility: 'private', shares: [] })).status).toBe(200);
    expect((await teammate.get(url)).status).toBe(404);
    expect((await owner.get(url)).status).toBe(200);
    expect((await owner.put(shares).send({ visibility: 'private', shares: [{ userId: teammateId, access: 'viewer' }] })).status).toBe(200);
    expect((await teammate.get(url)).status).toBe(200);
    expect((await teammate.get(`/api/sweeps/${sweepId}/results?limit=10`)).status).toBe(200);
    expect((await owner.put(shares).send({ visibility: 'private', shares: [] })).status).toBe(200);
    expect((await teammate.get(url)).status).toBe(404);
    expect((await teammate.get(`/api/sweeps/${sweepId}/results?limit=10`)).status).toBe(404);
  });

  it('see a change made outside this process (straight in the database) within ACCESS_TTL_MS', async () => {
    const url = `/api/sweeps/${sweepId}/designs?limit=10`;
    await ctx.db.query(`UPDATE studies SET visibility = 'team' WHERE id = $1`, [studyId]);
    expect((await teammate.get(url)).status).toBe(200);
    await ctx.db.query(`UPDATE studies SET visibility = 'private' WHERE id = $1`, [studyId]);
    const changedAt = Date.now();
    let status = 200;
    while (status === 200 && Date.now() - changedAt < ACCESS_TTL_MS + 2_000) {
      await new Promise((r) => setTimeout(r, 250));
      status = (await teammate.get(url)).status;
    }
    expect(status).toBe(404);
    expect(Date.now() - changedAt).toBeLessThan(ACCESS_TTL_MS + 1_000);
  }, 20_000);
});
