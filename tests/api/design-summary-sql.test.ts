/**
 * The trade table's per-design worst cases exist twice: summariseDesign (JavaScript, stored when a sweep's chunk
 * lands) and the scan-window aggregates (SQL, recomputed per request). A window that holds every steer must give
 * every summary column exactly as stored, for a randomly drawn sweep.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { mulberry32 } from '../../shared/bench/random.ts';
import { DESIGN_SUMMARY_COLUMNS } from '../../shared/sweep/columns.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let runner: SweepRunner;
let app: Express;
let engineer: AuthedClient;
let sweepId: string;

/** A grid drawn from a fixed seed: two values of each varied field, steers in both planes. */
function randomGrid(seed: number) {
  const rnd = mulberry32(seed);
  const pick = <T>(xs: T[]) => xs[Math.floor(rnd() * xs.length)]!;
  const two = (lo: number, hi: number, digits: number) => [lo + (hi - lo) * rnd(), lo + (hi - lo) * rnd()].map((x) => Number(x.toFixed(digits)));
  return {
    frequencyGHz: pick([26.5, 28, 39]),
    nx: [pick([2, 3, 4]), pick([6, 8])],
    ny: [1, pick([2, 4])],
    dxMm: two(3.8, 7.5, 2),
    taperX: [{ kind: 'uniform' }, pick([{ kind: 'hamming' }, { kind: 'taylor', sllDb: 25, nbar: 4 }])],
    phaseBits: [null, pick([3, 4, 6])],
    element: pick([{ kind: 'cosine', q: 1.5 }, { kind: 'tr38901' }]),
    channelPowerDbm: Number((5 + 10 * rnd()).toFixed(1)),
    steerAzDeg: [0, 20, -40, 60],
    steerElDeg: [0, 15],
  };
}

beforeAll(async () => {
  ctx = await openTestContext({ SWEEP_POINT_LIMIT: '5000' });
  await truncateAll(ctx.db);
  runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 2, embedded: true, recoverEverySeconds: 1 });
  ctx.sweeps = runner;
  app = createApp(ctx);
  const team = await seedTeam(ctx.db);
  engineer = await authed(app, team.engineer);
  const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Summary twins' });
  const res = await engineer.post(`/api/studies/${study.id}/sweeps`).send({ name: 'random grid', grid: randomGrid(20261201) });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  sweepId = res.body.id;
  const deadline = Date.now() + 90_000;
  for (;;) {
    const s = await engineer.get(`/api/sweeps/${sweepId}`);
    if (s.body.status === 'done') break;
    if (Date.now() > deadline) throw new Error(`sweep still ${s.body.status}`);
    await new Promise((r) => setTimeout(r, 200));
  }
});

afterAll(async () => {
  await runner?.stop();
  await ctx?.db.destroy();
});

const designs = async (qs: string) => {
  const res = await engineer.get(`/api/sweeps/${sweepId}/designs?limit=1000&sort=designIndex:asc${qs}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.rows as Array<Record<string, number | boolean | null>>;
};

describe('stored design summaries (JavaScript) and scan-window aggregates (SQL) agree', () => {
  it('a window over every steer reproduces every summary column of every design', async () => {
    const stored = await designs('');
    const windowed = await designs('&scanAz=-90..90&scanEl=-90..90');
    expect(stored.length).toBe(32);
    expect(windowed.map((r) => r.designIndex)).toEqual(stored.map((r) => r.designIndex));
    let compared = 0;
    for (const [i, row] of windowed.entries()) {
      for (const { field } of DESIGN_SUMMARY_COLUMNS) {
        const want = stored[i]![field];
        const got = row[field];
        if (typeof want === 'number') expect(got, `design ${row.designIndex} ${field}`).toBeCloseTo(want, 9);
        else expect(got, `design ${row.designIndex} ${field}`).toBe(want);
        if (want !== null) compared += 1;
      }
    }
    // Most columns carry a value: the comparison is not vacuous.
    expect(compared).toBeGreaterThan(stored.length * DESIGN_SUMMARY_COLUMNS.length * 0.7);
  });
});
