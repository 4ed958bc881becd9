/**
 * One finished sweep to read back through the API: a migrated, truncated database, a real sweep runner on two
 * threads, a team's signed-in engineer, another team's engineer, and the sweep run to completion before the tests.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, expect, inject } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { authed, seedTeam, type AuthedClient } from './auth.ts';
import { openTestContext, truncateAll } from './db.ts';

export interface SweepWorld {
  ctx: AppContext;
  app: Express;
  engineer: AuthedClient;
  outsider: AuthedClient;
  sweepId: string;
}

export function useFinishedSweep(name: string, grid: () => Record<string, unknown>, timeoutMs = 90_000): SweepWorld {
  const world = {} as SweepWorld;
  let runner: SweepRunner | undefined;
  beforeAll(async () => {
    world.ctx = await openTestContext({ SWEEP_POINT_LIMIT: '5000' });
    await truncateAll(world.ctx.db);
    runner = await startSweepRunner({ db: world.ctx.db, url: inject('databaseUrl'), log: world.ctx.log, threads: 2, embedded: true, recoverEverySeconds: 1 });
    world.ctx.sweeps = runner;
    world.app = createApp(world.ctx);
    const team = await seedTeam(world.ctx.db);
    const other = await seedTeam(world.ctx.db);
    world.engineer = await authed(world.app, team.engineer);
    world.outsider = await authed(world.app, other.engineer);
    const study = await world.ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Rooftop relay' });
    const res = await world.engineer.post(`/api/studies/${study.id}/sweeps`).send({ name, grid: grid() });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    world.sweepId = res.body.id;
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const s = await world.engineer.get(`/api/sweeps/${world.sweepId}`);
      if (s.body.status === 'done') break;
      if (Date.now() > deadline) throw new Error(`sweep still ${s.body.status}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  });
  afterAll(async () => {
    await runner?.stop();
    await world.ctx?.db.destroy();
  });
  return world;
}
