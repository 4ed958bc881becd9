/** The demo study ships the invented demo cost model, and its finished sweep is priced with it. */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { DEMO_USERS, seedAccounts } from '../../server/seed/accounts.ts';
import { seedDemoStudy } from '../../server/seed/demo-study.ts';
import { DEMO_COST_MODEL } from '../../shared/cost/index.ts';
import { authed, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
let engineer: AuthedClient;
let ids: { studyId: string; sweepId: string };

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  app = createApp(ctx);
  await seedAccounts(ctx);
  ids = (await seedDemoStudy(ctx))!;
  const demo = DEMO_USERS.find((u) => u.role === 'engineer')!;
  engineer = await authed(app, { email: demo.email, password: demo.password });
}, 120_000);

afterAll(async () => {
  await ctx?.db.destroy();
});

describe('demo cost model', () => {
  it('is the invented demo model, version 1', async () => {
    const res = await engineer.get(`/api/studies/${ids.studyId}/cost-model`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ model: DEMO_COST_MODEL, version: 1 });
  });

  it('prices every design of the demo sweep, and says which model version it used', async () => {
    const res = await engineer.get(`/api/sweeps/${ids.sweepId}/designs?limit=1000&sort=costUsd:asc`);
    expect(res.status).toBe(200);
    expect(res.body.cost).toEqual({ version: 1, currentVersion: 1, currency: 'USD', current: true });
    const rows = res.body.rows as { costUsd: number | null; beamformerChips: number | null; channels: number; dcPowerW: number | null }[];
    expect(rows.every((r) => typeof r.costUsd === 'number' && r.costUsd > 0)).toBe(true);
    // Chips follow ⌈channels / 4⌉ with the demo's 4-channel chip (hand rule, checked row by row).
    for (const r of rows) expect(r.beamformerChips).toBe(Math.ceil(r.channels / 4));
    const costs = rows.map((r) => r.costUsd!);
    expect(costs).toEqual([...costs].sort((a, b) => a - b));
  });
});
