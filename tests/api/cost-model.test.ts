/**
 * The study's cost model through the API, and the cost columns of a sweep's designs: priced when the sweep writes
 * them, re-priced when the model is saved, sortable and filterable on the server. Expected figures are worked out
 * by hand in the comments from the design (counts, pitch) and the model, not from the cost functions.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { putCostModel } from '../../server/services/cost-model-service.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { authed, seedTeam, type AuthedClient, type SeededTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let runner: SweepRunner;
let app: Express;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let outsider: AuthedClient;
let studyId: string;
let team: SeededTeam;

/** Two 1-row designs (4 and 10 elements, one channel each, 5.35 mm pitch, uniform, 10 dBm a channel), two steers. */
const GRID = { frequencyGHz: 28, nx: [4, 10], dxMm: 5.35, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10, steerAzDeg: [0, 30] };

const MODEL_A = {
  currency: 'EUR', channelsPerChip: 4, chipPrice: 10, elementPrice: 1, boardPricePerMm2: 0.01, boardMarginMm: 1,
  modulePrice: 5, paEfficiency: 0.25, channelOverheadW: 0.05, chipOverheadW: 0.1, txDutyCycle: 0.5,
};

beforeAll(async () => {
  ctx = await openTestContext({ SWEEP_POINT_LIMIT: '5000' });
  await truncateAll(ctx.db);
  runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 1, embedded: true, recoverEverySeconds: 1 });
  ctx.sweeps = runner;
  app = createApp(ctx);
  team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  engineer = await authed(app, team.engineer);
  reviewer = await authed(app, team.reviewer);
  outsider = await authed(app, other.engineer);
  studyId = (await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Priced module' })).id;
});

afterAll(async () => {
  await runner?.stop();
  await ctx?.db.destroy();
});

async function waitDone(sweepId: string): Promise<void> {
  const deadline = Date.now() + 60_000;
  for (;;) {
    const res = await engineer.get(`/api/sweeps/${sweepId}`);
    if (res.body.status === 'done') return;
    if (Date.now() > deadline) throw new Error(`sweep still ${res.body.status}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

type Row = { nx: number; costUsd: number | null; dcPowerW: number | null; heatWPerCm2: number | null; beamformerChips: number | null };
const byNx = (rows: Row[], nx: number) => rows.find((r) => r.nx === nx)!;

describe('GET/PUT /api/studies/:id/cost-model', () => {
  it('starts without a model', async () => {
    const res = await reviewer.get(`/api/studies/${studyId}/cost-model`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ studyId, model: null, version: null, updatedAt: null });
  });

  it('answers 400 naming the field and rule, and writes nothing', async () => {
    const bad = await engineer.put(`/api/studies/${studyId}/cost-model`).send({ ...MODEL_A, paEfficiency: 1.5 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('paEfficiency: must be a number greater than 0 and at most 1 (PA efficiency, P_out / P_dc)');
    const unknown = await engineer.put(`/api/studies/${studyId}/cost-model`).send({ ...MODEL_A, discount: 0.1 });
    expect(unknown.status).toBe(400);
    expect((await reviewer.get(`/api/studies/${studyId}/cost-model`)).body.model).toBeNull();
  });

  it('lets reviewers read only and hides the study from another team', async () => {
    expect((await reviewer.put(`/api/studies/${studyId}/cost-model`).send(MODEL_A)).status).toBe(403);
    expect((await outsider.get(`/api/studies/${studyId}/cost-model`)).status).toBe(404);
    expect((await outsider.put(`/api/studies/${studyId}/cost-model`).send(MODEL_A)).status).toBe(404);
  });

  it('saves the model as version 1', async () => {
    const res = await engineer.put(`/api/studies/${studyId}/cost-model`).send(MODEL_A);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ studyId, model: MODEL_A, version: 1, repricedSweeps: 0 });
  });
});

describe('cost columns of a sweep', () => {
  let sweepId: string;

  it('prices each design when the sweep writes it', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/sweeps`).send({ name: 'priced', grid: GRID });
    expect(res.status).toBe(201);
    sweepId = res.body.id;
    await waitDone(sweepId);
    const page = await engineer.get(`/api/sweeps/${sweepId}/designs?limit=10`);
    expect(page.status).toBe(200);
    expect(page.body.cost).toEqual({ version: 1, currentVersion: 1, currency: 'EUR', current: true });
    const four = byNx(page.body.rows, 4);
    const ten = byNx(page.body.rows, 10);
    // Hand-worked, nx = 4: ceil(4/4) = 1 chip × 10 = 10; 4 elements × 1 = 4; board (4 × 5.35 + 2) × (5.35 + 2) mm =
    // 23.4 × 7.35 = 171.99 mm² × 0.01 = 1.7199; module 5. Total 20.7199.
    expect(four.beamformerChips).toBe(1);
    expect(four.costUsd).toBeCloseTo(20.7199, 9);
    // Hand-worked, nx = 10: ceil(10/4) = 3 chips × 10 = 30; 10 × 1 = 10; (53.5 + 2) × 7.35 = 407.925 mm² × 0.01 = 4.07925; 5.
    expect(ten.beamformerChips).toBe(3);
    expect(ten.costUsd).toBeCloseTo(49.07925, 9);
  });

  it('draws DC power at the design\'s conducted power, with duty cycle and overheads', async () => {
    const rows = (await engineer.get(`/api/sweeps/${sweepId}/designs?limit=10`)).body.rows as Row[];
    // Hand-worked, nx = 4, uniform: conducted 4 × 10 mW = 40 mW; PAs 0.04 / 0.25 = 0.16 W × 0.5 duty = 0.08 W;
    // overheads 4 × 0.05 + 1 × 0.1 = 0.3 W; DC 0.38 W. Heat (0.38 − 0.5 × 0.04) = 0.36 W over 1.7199 cm².
    expect(byNx(rows, 4).dcPowerW).toBeCloseTo(0.38, 9);
    expect(byNx(rows, 4).heatWPerCm2).toBeCloseTo(0.36 / 1.7199, 9);
    // Hand-worked, nx = 10: conducted 100 mW; PAs 0.4 W × 0.5 = 0.2 W; overheads 0.5 + 0.3 = 0.8 W; DC 1.0 W.
    // Heat (1.0 − 0.05) = 0.95 W over 4.07925 cm².
    expect(byNx(rows, 10).dcPowerW).toBeCloseTo(1.0, 9);
    expect(byNx(rows, 10).heatWPerCm2).toBeCloseTo(0.95 / 4.07925, 9);
  });

  it('sorts and filters on cost and power on the server', async () => {
    const desc = await engineer.get(`/api/sweeps/${sweepId}/designs?sort=costUsd:desc`);
    expect(desc.body.rows.map((r: Row) => r.nx)).toEqual([10, 4]);
    const cool = await engineer.get(`/api/sweeps/${sweepId}/designs?filter[dcPowerW]=..0.5`);
    expect(cool.body.rows.map((r: Row) => r.nx)).toEqual([4]);
    const chips = await engineer.get(`/api/sweeps/${sweepId}/designs?filter[beamformerChips]=2..`);
    expect(chips.body.rows.map((r: Row) => r.nx)).toEqual([10]);
    const bad = await engineer.get(`/api/sweeps/${sweepId}/designs?filter[costUsd]=cheap`);
    expect(bad.status).toBe(400);
  });

  it('re-prices the stored designs when the model is saved again', async () => {
    const res = await engineer.put(`/api/studies/${studyId}/cost-model`).send({ ...MODEL_A, chipPrice: 100, txDutyCycle: 1 });
    expect(res.body).toMatchObject({ version: 2, repricedSweeps: 1 });
    const page = await engineer.get(`/api/sweeps/${sweepId}/designs?limit=10`);
    expect(page.body.cost).toEqual({ version: 2, currentVersion: 2, currency: 'EUR', current: true });
    // Hand-worked: the chips now cost 100 each: nx = 4 → 100 + 4 + 1.7199 + 5 = 110.7199; nx = 10 → 300 + 10 + 4.07925 + 5.
    expect(byNx(page.body.rows, 4).costUsd).toBeCloseTo(110.7199, 9);
    expect(byNx(page.body.rows, 10).costUsd).toBeCloseTo(319.07925, 9);
    // Hand-worked, nx = 4 at full duty: PAs 0.16 W + overheads 0.3 W = 0.46 W.
    expect(byNx(page.body.rows, 4).dcPowerW).toBeCloseTo(0.46, 9);
  });
});

describe('re-pricing after the save (many stored designs)', () => {
  it('commits the save at once, says the figures are behind, and brings them to the new model', async () => {
    const user = { id: team.engineer.id, email: team.engineer.email, name: team.engineer.name, role: team.engineer.role, teamId: team.team.id };
    const sweepId = (await engineer.get(`/api/studies/${studyId}/sweeps`)).body.map((s: { id: string }) => s.id)[0] as string;
    // An inline limit of 0 designs sends every save down the after-the-save path.
    const saved = await putCostModel(ctx, user, studyId, { ...MODEL_A, modulePrice: 50 }, 0);
    expect(saved).toMatchObject({ version: 3, repricedSweeps: 0, repricing: true });
    const deadline = Date.now() + 30_000;
    let page = await engineer.get(`/api/sweeps/${sweepId}/designs?limit=10`);
    while (!page.body.cost.current && Date.now() < deadline) {
      expect(page.body.cost).toMatchObject({ version: 2, currentVersion: 3, current: false });
      await new Promise((r) => setTimeout(r, 100));
      page = await engineer.get(`/api/sweeps/${sweepId}/designs?limit=10`);
    }
    expect(page.body.cost).toEqual({ version: 3, currentVersion: 3, currency: 'EUR', current: true });
    // Hand-worked: model A with the module at 50 instead of 5: nx = 4 → 10 + 4 + 1.7199 + 50 = 65.7199.
    expect(byNx(page.body.rows, 4).costUsd).toBeCloseTo(65.7199, 9);
  });
});

describe('duplicating a study', () => {
  it('copies its cost model as version 1 of the copy', async () => {
    const res = await engineer.post(`/api/studies/${studyId}/duplicate`);
    expect(res.status).toBe(201);
    const copy = await engineer.get(`/api/studies/${res.body.id}/cost-model`);
    expect(copy.body).toMatchObject({ model: { ...MODEL_A, modulePrice: 50 }, version: 1 });
  });
});
