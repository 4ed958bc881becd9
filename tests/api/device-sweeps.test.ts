/**
 * Sweeps over a device, stored and run like any sweep: one module's candidate varied with the layout and codebook
 * rules fixed, each variant's coverage computed on the sweep worker pool by the runner, judged against the device's
 * own sheet, read back through the trade table's designs endpoint. Real PostgreSQL, real pg-boss, real threads.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { COVERAGE_CAUTIONS, computeCoverage, gridCodebook } from '../../shared/coverage/index.ts';
import { DEMO_COST_MODEL } from '../../shared/cost/index.ts';
import type { CoverageResult } from '../../shared/coverage/coverage-result.ts';
import { CoverageRequestSchema } from '../../shared/schemas/coverage.ts';
import { DesignSchema, type Design } from '../../shared/schemas/design.ts';
import { demoPatchPattern, patternCsv } from '../../shared/patterns/demo-patch-pattern.ts';
import { HANDSET_28GHZ, SMALL_CELL_39GHZ } from '../../shared/targets/presets.ts';
import type { TargetSheet } from '../../shared/targets/sheet.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

let ctx: AppContext;
let app: Express;
let runner: SweepRunner | undefined;
let engineer: AuthedClient;
let reviewer: AuthedClient;
let outsider: AuthedClient;
let studyId: string;

const GRID = 'az -45:45:15 × el 0';
/** The varied module's candidate: a 28 GHz 1 × 4 of cos^1.5 elements at 10 dBm per channel. */
const EDGE = { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 5, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10 };
/** The fixed module's candidate: the same array of an uploaded patch-like element at 0 dBm per channel. */
const PATCH = (patternId: string) => ({ ...EDGE, element: { kind: 'table', patternId }, channelPowerDbm: 0 });

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  app = createApp(ctx);
  const team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  engineer = await authed(app, team.engineer);
  reviewer = await authed(app, team.reviewer);
  outsider = await authed(app, other.engineer);
  studyId = (await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Two-edge phone' })).id;
});

afterAll(async () => {
  await runner?.stop();
  await ctx?.db.destroy();
});

async function waitDone(sweepId: string, timeoutMs = 120_000): Promise<Record<string, unknown>> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await engineer.get(`/api/sweeps/${sweepId}`);
    expect(res.status).toBe(200);
    if (['done', 'failed', 'cancelled'].includes(res.body.status)) return res.body;
    if (Date.now() > deadline) throw new Error(`device sweep still ${res.body.status} (${res.body.pointsDone} of ${res.body.pointsTotal})`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

const must = <T>(res: { status: number; body: T }, status: number): T => {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  return res.body;
};

/** The device's coverage for one variant, computed here with the coverage engine alone (not the device helpers). */
function directCoverage(modules: { design: Design; face: string }[], region: Record<string, unknown>): CoverageResult {
  const request = CoverageRequestSchema.parse({
    modules: modules.map((m) => ({ design: { ...m.design, codes: null }, orientation: m.face, beams: gridCodebook(GRID) })),
    region,
    percentiles: [10, 50, 90],
  });
  return computeCoverage(request);
}

describe('a sweep over a device', () => {
  let edgeId: string;
  let patchId: string;
  let patternId: string;
  let handsetSheet: { id: string; sheet: TargetSheet };
  let deviceId: string;
  let sweepId: string;
  let pattern: unknown;

  it('is stored while no runner runs and computed by the next runner to start (as after a restart)', { timeout: 180_000 }, async () => {
    // The study's first sheet is the small cell's; the device names the handset sheet, which must be the one used.
    must(await engineer.post(`/api/studies/${studyId}/target-sheets`).send({ preset: 'small-cell-39ghz', sheet: SMALL_CELL_39GHZ.sheet }), 201);
    handsetSheet = must(await engineer.post(`/api/studies/${studyId}/target-sheets`).send({ preset: 'handset-28ghz', sheet: HANDSET_28GHZ.sheet }), 201);
    const upload = await engineer.post(`/api/studies/${studyId}/element-patterns`).field('name', 'Patch A').attach('file', Buffer.from(patternCsv(demoPatchPattern(5))), 'patch.csv');
    patternId = must(upload, 201).id;
    pattern = must(await engineer.get(`/api/element-patterns/${patternId}`), 200).pattern;
    edgeId = must(await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Edge 1×4', design: EDGE }), 201).id;
    // The fixed module's candidate has an uploaded (table) element: the server must hand its values to the threads.
    // At 0 dBm per channel it cannot meet the sheet's peak alone, so the varied module decides pass or fail.
    patchId = must(await engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Patch 1×4', design: PATCH(patternId) }), 201).id;
    const layout = {
      outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
      modules: [
        { candidateId: edgeId, face: 'right', codebook: { kind: 'grid', grid: GRID } },
        { candidateId: patchId, face: 'left', codebook: { kind: 'grid', grid: GRID } },
      ],
    };
    deviceId = must(await engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'Phone', targetSheetId: handsetSheet.id, layout }), 201).id;

    const created = must(await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ name: 'Edge pitch and power', moduleIndex: 0, vary: { nx: [2, 4, 8], channelPowerDbm: [4, 12] } }), 201);
    expect(created.pointsTotal).toBe(6);
    sweepId = created.id;
    const queued = must(await engineer.get(`/api/sweeps/${sweepId}`), 200);
    expect(queued).toMatchObject({ status: 'queued', pointsDone: 0, pointsTotal: 6, designsTotal: 6, anglesPerDesign: 1, targetSheetId: handsetSheet.id });
    expect(queued.device).toMatchObject({ deviceId, deviceName: 'Phone', moduleIndex: 0, region: { kind: 'sphere' }, vary: { nx: [2, 4, 8], channelPowerDbm: [4, 12] } });
    // It is listed with the study's sweeps like any other.
    expect((must(await reviewer.get(`/api/studies/${studyId}/sweeps`), 200) as { id: string }[]).map((s) => s.id)).toContain(sweepId);

    runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 2, embedded: true, recoverEverySeconds: 1 });
    ctx.sweeps = runner;
    const done = await waitDone(sweepId);
    expect(done).toMatchObject({ status: 'done', pointsDone: 6, pointsFailed: 0 });
    const [chunks] = (await ctx.db.query(`SELECT count(*)::int AS n, count(*) FILTER (WHERE status = 'done')::int AS done FROM sweep_chunks WHERE sweep_id = $1`, [sweepId])) as { n: number; done: number }[];
    expect(chunks).toEqual({ n: 6, done: 6 }); // one chunk per variant
  });

  it('stores one design row per variant whose peak and 50th-percentile EIRP equal a direct coverage computation', { timeout: 120_000 }, async () => {
    const page = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?sort=designIndex:asc&limit=100`), 200);
    expect(page.total).toBe(6);
    const sheet = handsetSheet.sheet;
    const patch = DesignSchema.parse({ ...PATCH(patternId), element: { kind: 'table', patternId, pattern } });
    let i = 0;
    const verdicts: boolean[] = [];
    // Variants in the order the request lists them, the first varied field slowest (nx, then channelPowerDbm).
    for (const nx of [2, 4, 8]) {
      for (const channelPowerDbm of [4, 12]) {
        const row = page.rows[i] as Record<string, number | null>;
        expect(row).toMatchObject({ designIndex: i, nx, channelPowerDbm, ny: 1, dxMm: 5.35, beams: 14, sectorMinEirpDbm: null });
        const expected = directCoverage([{ design: DesignSchema.parse({ ...EDGE, nx, channelPowerDbm }), face: 'right' }, { design: patch, face: 'left' }], { kind: 'sphere' });
        // Same engine, same inputs, same automatic sampling: the stored figures are those numbers (to 1e-9 dB, what a
        // double carries through JSON and PostgreSQL). The engine's own accuracy is checked in convergence.test.ts.
        expect(row.peakEirpDbm).toBeCloseTo(expected.peakEirpDbm!, 9);
        expect(row.p50EirpDbm).toBeCloseTo(expected.eirpPercentilesDbm['50']!, 9);
        // Pass/fail follows the device's handset sheet: peak and 50th percentile at or above its floors (the module
        // limits of the sheet are not applicable to a device). Not the study's first (small-cell) sheet.
        const failed = [
          ...(expected.peakEirpDbm! < sheet.minPeakEirpDbm! ? ['minPeakEirpDbm'] : []),
          ...(expected.eirpPercentilesDbm['50']! < sheet.minCoverageP50EirpDbm! ? ['minCoverageP50EirpDbm'] : []),
        ];
        const point = must(await reviewer.get(`/api/sweeps/${sweepId}/results?designIndex=${i}`), 200).rows[0];
        expect(point.error).toBeNull();
        expect(point.metrics.pass).toBe(failed.length === 0);
        expect([...point.metrics.failed].sort()).toEqual(failed.sort());
        // Each coverage result carries the coverage cautions.
        expect(point.metrics.cautions).toEqual([...COVERAGE_CAUTIONS]);
        verdicts.push(failed.length === 0);
        i++;
      }
    }
    // The variants span the sheet: 2 elements at 4 dBm per channel cannot reach a 22.4 dBm peak, 8 at 12 dBm can.
    expect(verdicts).toContain(true);
    expect(verdicts).toContain(false);
  });

  it('sorts and filters by the coverage columns on the server', async () => {
    const all = (must(await reviewer.get(`/api/sweeps/${sweepId}/designs?limit=100`), 200).rows as { designIndex: number; p50EirpDbm: number }[]);
    const byP50 = [...all].sort((a, b) => b.p50EirpDbm - a.p50EirpDbm).map((r) => r.designIndex);
    const desc = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?sort=p50EirpDbm:desc&limit=100`), 200).rows as { designIndex: number }[];
    expect(desc.map((r) => r.designIndex)).toEqual(byP50);
    const asc = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?sort=p50EirpDbm:asc&limit=100`), 200).rows as { designIndex: number }[];
    expect(asc.map((r) => r.designIndex)).toEqual([...byP50].reverse());
    const floor = HANDSET_28GHZ.sheet.minCoverageP50EirpDbm!;
    const filtered = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?filter[p50EirpDbm]=${floor}..&limit=100`), 200);
    expect(filtered.total).toBe(all.filter((r) => r.p50EirpDbm >= floor).length);
    // A scan window (the handset sheet's ±45°) does not apply: a device's coverage has no steering to window.
    const windowed = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?sort=designIndex:asc&limit=100&scanAz=-45..45`), 200);
    expect(windowed.rows.map((r: { p50EirpDbm: number }) => r.p50EirpDbm)).toEqual(
      [...all].sort((a, b) => a.designIndex - b.designIndex).map((r) => r.p50EirpDbm),
    );
  });

  it('is not offered for sign-off as module designs, and a cost-model save leaves its rows unpriced', async () => {
    const search = must(await reviewer.get(`/api/studies/${studyId}/design-search?q=&limit=50`), 200) as { hits: { kind: string; key: string }[] };
    expect(search.hits.filter((h) => h.key.startsWith(`sweep:${sweepId}:`))).toEqual([]);
    const refused = await reviewer.post(`/api/studies/${studyId}/decisions`).send({ design: `${sweepId}:0`, rationale: 'Best P50.', sign: false });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields[0].field).toBe('design');
    expect(refused.body.error.message).toMatch(/^design: is a variant of a device sweep/);
    // Module prices do not apply to a device's variants: none is written, and the sweep is not left "behind".
    must(await engineer.put(`/api/studies/${studyId}/cost-model`).send(DEMO_COST_MODEL), 200);
    const [{ priced }] = (await ctx.db.query(`SELECT count(cost_usd)::int AS priced FROM sweep_designs WHERE sweep_id = $1`, [sweepId])) as [{ priced: number }];
    expect(priced).toBe(0);
    const page = must(await reviewer.get(`/api/sweeps/${sweepId}/designs?limit=1`), 200) as { cost: { current: boolean } };
    expect(page.cost.current).toBe(true);
  });

  it('judges over the sheet\'s service sector when the device names a small-cell sheet', { timeout: 120_000 }, async () => {
    const sheets = must(await engineer.get(`/api/studies/${studyId}/target-sheets`), 200) as { id: string; sheet: TargetSheet }[];
    const small = sheets.find((s) => s.sheet.serviceSector)!;
    const layout = { outline: { widthMm: 200, heightMm: 300, depthMm: 40 }, modules: [{ candidateId: edgeId, face: 'front', codebook: { kind: 'grid', grid: GRID } }] };
    const panel = must(await engineer.post(`/api/studies/${studyId}/devices`).send({ name: 'Panel', targetSheetId: small.id, layout }), 201).id;
    const { id } = must(await engineer.post(`/api/devices/${panel}/sweeps`).send({ moduleIndex: 0, vary: { channelPowerDbm: [6, 14] } }), 201);
    const done = await waitDone(id);
    expect(done).toMatchObject({ status: 'done', name: 'Panel: M1 varied', targetSheetId: small.id });
    const rows = must(await reviewer.get(`/api/sweeps/${id}/designs?sort=designIndex:asc`), 200).rows as Record<string, number | null>[];
    const s = small.sheet.serviceSector!;
    for (const [i, p] of [6, 14].entries()) {
      const expected = directCoverage([{ design: DesignSchema.parse({ ...EDGE, channelPowerDbm: p }), face: 'front' }], { kind: 'sector', ...s });
      expect(rows[i]!.sectorMinEirpDbm).toBeCloseTo(expected.minEirpDbm!, 9); // same engine and inputs (see above)
      expect(rows[i]!.peakEirpDbm).toBeCloseTo(expected.peakEirpDbm!, 9);
      expect(rows[i]!.beams).toBe(7);
    }
  });

  it('can be cancelled like any sweep', { timeout: 60_000 }, async () => {
    const { id } = must(await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 1, vary: { nx: [4, 6, 8, 10, 12, 14, 16, 18] } }), 201);
    const cancelled = must(await engineer.post(`/api/sweeps/${id}/cancel`), 200);
    expect(cancelled.status).toBe('cancelled');
    await new Promise((r) => setTimeout(r, 1500)); // a variant already on a thread finishes, but is not written
    const after = must(await engineer.get(`/api/sweeps/${id}`), 200);
    expect(after.status).toBe('cancelled');
    const [{ n }] = (await ctx.db.query(`SELECT count(*)::int AS n FROM sweep_designs WHERE sweep_id = $1`, [id])) as [{ n: number }];
    expect(n).toBe(after.pointsDone);
    expect(n).toBeLessThan(8);
  });

  it('answers 400 naming the field, 403 for a reviewer and 404 for another team, and stores nothing', async () => {
    const count = async () => ((await ctx.db.query(`SELECT count(*)::int AS n FROM sweeps`)) as { n: number }[])[0]!.n;
    const before = await count();
    const many = await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 0, vary: { nx: [2, 3, 4, 5, 6, 7, 8], dxMm: [4, 4.5, 5, 5.5, 6, 6.5, 7, 7.5] } });
    expect(many.status).toBe(400);
    expect(many.body.error.message).toBe('vary: gives 56 variants; at most 48');
    const missing = await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 3, vary: { nx: [4] } });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields[0].field).toBe('moduleIndex');
    const zero = await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 0, vary: { nx: [0] } });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields[0].field).toBe('vary.nx');
    const unknown = await engineer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 0, vary: { taperX: [1] } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.message).toMatch(/^vary/);
    expect((await reviewer.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 0, vary: { nx: [4] } })).status).toBe(403);
    expect((await outsider.post(`/api/devices/${deviceId}/sweeps`).send({ moduleIndex: 0, vary: { nx: [4] } })).status).toBe(404);
    expect(await count()).toBe(before);
  });
});
