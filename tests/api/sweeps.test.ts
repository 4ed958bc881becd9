import { spawnSync } from 'node:child_process';
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { authed, seedTeam, type AuthedClient, type SeededTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let runner: SweepRunner;
let app: Express;
let team: SeededTeam;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let outsider: AuthedClient;
let studyId: string;

/** 2 × 2 designs × 2 angles: small enough to compare every point with `cli evaluate`. */
const SMALL_GRID = {
  frequencyGHz: 28,
  nx: [4, 8],
  dxMm: 5.35,
  phaseBits: [null, 6],
  element: { kind: 'cosine', q: 1.5 },
  channelPowerDbm: 10,
  steerAzDeg: [0, 30],
};

beforeAll(async () => {
  ctx = await openTestContext({ SWEEP_POINT_LIMIT: '5000' });
  await truncateAll(ctx.db);
  runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 2, embedded: true, recoverEverySeconds: 1 });
  ctx.sweeps = runner;
  app = createApp(ctx);
  team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  engineer = await authed(app, team.engineer);
  reviewer = await authed(app, team.reviewer);
  outsider = await authed(app, other.engineer);
  const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Handset module' });
  studyId = study.id;
});

afterAll(async () => {
  await runner?.stop();
  await ctx?.db.destroy();
});

async function waitFor(sweepId: string, done: (s: { status: string; pointsDone: number }) => boolean, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await engineer.get(`/api/sweeps/${sweepId}`);
    expect(res.status).toBe(200);
    if (done(res.body)) return res.body;
    if (Date.now() > deadline) throw new Error(`sweep ${sweepId} still ${res.body.status} (${res.body.pointsDone} points)`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

describe('a small sweep through the API', () => {
  let sweepId: string;

  it('starts with 201 and the point count', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'pitch check', grid: SMALL_GRID });
    expect(res.status).toBe(201);
    expect(res.body.pointsTotal).toBe(8);
    sweepId = res.body.id;
  });

  it('finishes, and every row matches `cli evaluate` of its resolved design', async () => {
    const final = await waitFor(sweepId, (s) => s.status === 'done');
    expect(final.pointsDone).toBe(8);
    expect(final.pointsFailed).toBe(0);
    expect(final.etaSeconds).toBe(0);
    const res = await engineer.get(`/api/sweeps/${sweepId}/results?limit=1000`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(8);
    const rows = res.body.rows as { index: number; design: Record<string, unknown>; metrics: unknown; designIndex: number; angleIndex: number }[];
    expect(rows.map((r) => r.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    // Steering is innermost: points 2k and 2k+1 are one design at 0° and 30°.
    expect(rows.map((r) => r.design.steerAzDeg)).toEqual([0, 30, 0, 30, 0, 30, 0, 30]);
    expect(rows.map((r) => r.designIndex)).toEqual([0, 0, 1, 1, 2, 2, 3, 3]);
    const cli = spawnSync('node', ['--import', 'tsx', 'server/cli/index.ts', 'evaluate'], {
      input: JSON.stringify(rows.map((r) => r.design)),
      encoding: 'utf8',
    });
    expect(cli.status, cli.stderr).toBe(0);
    expect(rows.map((r) => r.metrics)).toEqual(JSON.parse(cli.stdout));
  });

  it('lists the study sweeps with their status', async () => {
    const res = await reviewer.get(`/api/studies/${studyId}/sweeps`);
    expect(res.status).toBe(200);
    expect(res.body.find((s: { id: string }) => s.id === sweepId)?.status).toBe('done');
  });

  it('keeps one row per design with worst cases over its angles', async () => {
    const res = await engineer.get(`/api/sweeps/${sweepId}/designs?sort=designIndex:asc`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(4);
    const points = (await engineer.get(`/api/sweeps/${sweepId}/results?designIndex=1`)).body.rows as { metrics: { scanLossDb: number; eirpDbm: number } }[];
    expect(points).toHaveLength(2);
    const d1 = res.body.rows[1];
    expect(d1.angles).toBe(2);
    // Edge of scan here is the 30° point (the farther from broadside).
    expect(d1.scanLossEdgeDb).toBeCloseTo(points[1]!.metrics.scanLossDb, 12);
    expect(d1.peakEirpDbm).toBeCloseTo(Math.max(...points.map((p) => p.metrics.eirpDbm)), 12);
  });

  it('sorts and filters the results by metric and parameter columns', async () => {
    const sorted = await engineer.get(`/api/sweeps/${sweepId}/results?sort=directivityDbi:desc`);
    const d = sorted.body.rows.map((r: { metrics: { directivityDbi: number } }) => r.metrics.directivityDbi);
    expect(d).toEqual([...d].sort((a: number, b: number) => b - a));
    const filtered = await engineer.get(`/api/sweeps/${sweepId}/results?filter[nx]=8..8&filter[steerAzDeg]=30`);
    expect(filtered.body.total).toBe(2);
    expect(filtered.body.rows.every((r: { design: { nx: number; steerAzDeg: number } }) => r.design.nx === 8 && r.design.steerAzDeg === 30)).toBe(true);
    const json = await engineer.get(`/api/sweeps/${sweepId}/results`).query({ filters: JSON.stringify({ phaseBits: 6, nx: { max: 4 } }) });
    expect(json.body.total).toBe(2);
  });

  it('answers the steering span of the stored points in one request', async () => {
    // The grid above steers az 0 and 30 at the default elevation 0 (SMALL_GRID).
    const res = await engineer.get(`/api/sweeps/${sweepId}/steer-span`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ span: { azMinDeg: 0, azMaxDeg: 30, elMinDeg: 0, elMaxDeg: 0 } });
    const bad = await engineer.get(`/api/sweeps/${sweepId}/steer-span?zz=1`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/zz/);
  });

  it('refuses unknown sort and filter fields with a 400 naming them', async () => {
    const bad = await engineer.get(`/api/sweeps/${sweepId}/results?sort=color:asc`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/^query\.sort: "color" is not a sortable field/);
    const range = await engineer.get(`/api/sweeps/${sweepId}/results?filter[nx]=9..2`);
    expect(range.status).toBe(400);
    expect(range.body.error.message).toMatch(/filter\.nx/);
    const limit = await engineer.get(`/api/sweeps/${sweepId}/results?limit=5000`);
    expect(limit.status).toBe(400);
    expect(limit.body.error.message).toMatch(/^query\.limit: /);
  });

  it('streams every row as CSV', async () => {
    const res = await engineer.get(`/api/sweeps/${sweepId}/results.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.trim().split('\n');
    expect(lines).toHaveLength(9);
    expect(lines[0]!.split(',').slice(0, 3)).toEqual(['index', 'designIndex', 'angleIndex']);
  });

  it('streams progress as server-sent events that end when the sweep is finished', async () => {
    const res = await engineer.get(`/api/sweeps/${sweepId}/events`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/event-stream/);
    const data = [...res.text.matchAll(/^event: progress\ndata: (.*)$/gm)].map((m) => JSON.parse(m[1]!));
    expect(data.at(-1).status).toBe('done');
    expect(res.text).toMatch(/event: end/);
  });
});

describe('who may run and read sweeps', () => {
  it('a reviewer cannot start a sweep (403); another team sees 404', async () => {
    const body = { name: 'x', grid: SMALL_GRID };
    expect((await reviewer.post(`/api/studies/${studyId}/sweeps`).send(body)).status).toBe(403);
    expect((await outsider.post(`/api/studies/${studyId}/sweeps`).send(body)).status).toBe(404);
    const list = await engineer.get(`/api/studies/${studyId}/sweeps`);
    const some = list.body[0].id as string;
    expect((await outsider.get(`/api/sweeps/${some}`)).status).toBe(404);
    expect((await outsider.get(`/api/sweeps/${some}/results`)).status).toBe(404);
    expect((await reviewer.post(`/api/sweeps/${some}/cancel`)).status).toBe(403);
  });
});

describe('bad grids', () => {
  it('over the point limit: 400 whose message has the count', async () => {
    // 64 × 100 steering angles = 6,400 points > the 5,000 limit set for this file.
    const grid = { frequencyGHz: 28, nx: Array.from({ length: 64 }, (_, i) => i + 1), dxMm: 5, steerAzDeg: Array.from({ length: 100 }, (_, i) => i * 0.5) };
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'huge', grid });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('6,400');
    expect(res.body.error.fields[0].field).toBe('grid');
  });

  it('a bad value: 400 naming the field and its list index', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'bad', grid: { ...SMALL_GRID, nx: [4, 65] } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('grid.nx[1]: must be an integer from 1 to 64');
  });

  it('a bad combination: 400 naming the field', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'bad', grid: { ...SMALL_GRID, nx: [2, 4], taperX: { kind: 'hann' } } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^grid\.taperX: Hann over exactly 2 elements/);
  });

  it('constraints that drop every design: 400 naming constraints', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'none', grid: SMALL_GRID, constraints: { maxChannels: 2 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].field).toBe('constraints');
  });
});

describe('cancel', () => {
  it('stops a running sweep; the points so far stay and no more are written', async () => {
    const grid = { frequencyGHz: 28, nx: [8, 16], ny: [4, 8], dxMm: [5, 5.35, 5.9], taperX: [{ kind: 'uniform' }, { kind: 'hamming' }, { kind: 'hann' }, { kind: 'chebyshev', sllDb: 30 }], phaseBits: [null, 4], steerAzDeg: Array.from({ length: 31 }, (_, i) => i * 2) };
    const start = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'to cancel', grid });
    expect(start.status).toBe(201);
    const id = start.body.id as string;
    await waitFor(id, (s) => s.pointsDone > 0);
    const res = await engineer.post(`/api/sweeps/${id}/cancel`);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('cancelled');
    await new Promise((r) => setTimeout(r, 1500));
    const after = await engineer.get(`/api/sweeps/${id}`);
    expect(after.body.status).toBe('cancelled');
    expect(after.body.pointsDone).toBeLessThan(start.body.pointsTotal);
    const [{ n }] = await ctx.db.query(`SELECT count(*)::int AS n FROM sweep_points WHERE sweep_id = $1`, [id]);
    expect(n).toBe(after.body.pointsDone);
    expect((await engineer.post(`/api/sweeps/${id}/cancel`)).status).toBe(409);
  });
});
