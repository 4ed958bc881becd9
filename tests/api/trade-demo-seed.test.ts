/** The demo study: a new user signs in and finds a finished sweep with a full trade table; seeding twice adds nothing. */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { DEMO_USERS, seedAccounts } from '../../server/seed/accounts.ts';
import { DEMO_STUDY_NAME, seedDemoStudy } from '../../server/seed/demo-study.ts';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { authed, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
let engineer: AuthedClient;

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  app = createApp(ctx);
  await seedAccounts(ctx);
  const first = await seedDemoStudy(ctx);
  expect(first).not.toBeNull();
  const demo = DEMO_USERS.find((u) => u.role === 'engineer')!;
  engineer = await authed(app, { email: demo.email, password: demo.password });
}, 120_000);

afterAll(async () => {
  await ctx?.db.destroy();
});

describe('seedDemoStudy(ctx)', () => {
  it('is idempotent: a second run adds no study, sweep or point', async () => {
    const count = async () =>
      (await ctx.db.query(
        `SELECT (SELECT count(*) FROM studies)::int AS studies, (SELECT count(*) FROM sweeps)::int AS sweeps,
                (SELECT count(*) FROM sweep_points)::int AS points, (SELECT count(*) FROM candidates)::int AS candidates`,
      )) as [{ studies: number; sweeps: number; points: number; candidates: number }];
    const before = await count();
    expect(await seedDemoStudy(ctx)).toBeNull();
    expect(await count()).toEqual(before);
  });

  it('gives the demo engineer a study with candidates, the handset target sheet and a finished sweep', async () => {
    const studies = await engineer.get('/api/studies');
    expect(studies.status).toBe(200);
    const list = Array.isArray(studies.body) ? studies.body : studies.body.studies ?? studies.body.items;
    const study = list.find((s: { name: string }) => s.name === DEMO_STUDY_NAME);
    expect(study).toBeDefined();
    const candidates = await engineer.get(`/api/studies/${study.id}/candidates`);
    expect(candidates.body.length).toBeGreaterThanOrEqual(3);
    const sheet = await engineer.get(`/api/studies/${study.id}/target-sheet`);
    expect(sheet.body.preset).toBe('handset-28ghz');
    const sweeps = await engineer.get(`/api/studies/${study.id}/sweeps`);
    expect(sweeps.body).toHaveLength(1);
    const sweep = sweeps.body[0];
    expect(sweep.status).toBe('done');
    // 4 nx × 2 ny × 3 pitches × 2 tapers × 2 phase-bit counts = 96 designs, × 7 steering angles.
    expect(sweep.pointsTotal).toBe(672);
    expect(sweep.pointsDone).toBe(672);
    const designs = await engineer.get(`/api/sweeps/${sweep.id}/designs?limit=1000`);
    expect(designs.body.total).toBe(96);
  });

  it('holds both sheets and judges the 39 GHz panel against the small-cell one', async () => {
    const list = (await engineer.get('/api/studies')).body as { id: string; name: string }[];
    const study = list.find((s) => s.name === DEMO_STUDY_NAME)!;
    const sheets = (await engineer.get(`/api/studies/${study.id}/target-sheets`)).body as { id: string; preset: string }[];
    expect(sheets.map((s) => s.preset)).toEqual(['handset-28ghz', 'small-cell-39ghz']);
    const candidates = (await engineer.get(`/api/studies/${study.id}/candidates`)).body as { design: { frequencyGHz: number }; targetSheetId: string }[];
    for (const c of candidates) {
      expect(c.targetSheetId).toBe(c.design.frequencyGHz === 39 ? sheets[1]!.id : sheets[0]!.id);
    }
    const sweep = (await engineer.get(`/api/studies/${study.id}/sweeps`)).body[0];
    expect(sweep.targetSheetId).toBe(sheets[0]!.id);
  });

  it('holds a phone judged against the handset sheet and the panel against the small-cell sheet', async () => {
    const list = (await engineer.get('/api/studies')).body as { id: string; name: string }[];
    const study = list.find((s) => s.name === DEMO_STUDY_NAME)!;
    const sheets = (await engineer.get(`/api/studies/${study.id}/target-sheets`)).body as { id: string }[];
    const devices = (await engineer.get(`/api/studies/${study.id}/devices`)).body as { targetSheetId: string; layout: { modules: unknown[] } }[];
    expect(devices.map((d) => d.targetSheetId)).toEqual([sheets[0]!.id, sheets[1]!.id]);
    expect(devices.map((d) => d.layout.modules.length)).toEqual([2, 1]);
  });

  it('stores points that match the engine evaluated afresh', async () => {
    const [row] = (await ctx.db.query(
      `SELECT design, metrics FROM sweep_points WHERE error IS NULL ORDER BY point_index LIMIT 1 OFFSET 137`,
    )) as { design: unknown; metrics: { directivityDbi: number; hpbwAzDeg: number } }[];
    const fresh = evaluateDesign(DesignSchema.parse(row!.design));
    expect(row!.metrics.directivityDbi).toBeCloseTo(fresh.directivityDbi, 9);
    expect(row!.metrics.hpbwAzDeg).toBeCloseTo(fresh.hpbwAzDeg, 9);
  });
});
