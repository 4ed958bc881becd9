/**
 * `npm run bench -- cost`: re-pricing and cost-column queries at 100,000 designs in a throw-away PostgreSQL.
 * One sweep of 100,000 one-angle designs (parameters from a real grid, metrics synthetic and seeded); the study's
 * cost model is saved again (the re-pricing a model save does inside its transaction), then the trade table's
 * cost sorts and filters are timed. Only time matters here; the arithmetic is tested in tests/shared/cost-model.test.ts.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { DEMO_COST_MODEL } from '../shared/cost/index.ts';
import type { PointResult } from '../shared/sweep/chunk.ts';
import { compileGrid } from '../shared/sweep/grid.ts';
import { SweepGridShapeSchema } from '../shared/sweep/grid-schema.ts';
import { DesignsQuerySchema } from '../shared/sweep/results-query.ts';
import type { AppContext } from '../server/context.ts';
import { startCluster } from '../server/db/cluster.ts';
import { freePort } from '../server/db/free-port.ts';
import { createDataSource } from '../server/data-source.ts';
import { Sweep } from '../server/entities/sweep.ts';
import { listDesigns } from '../server/services/sweep-results.ts';
import { repriceStudySweeps } from '../server/services/sweep-pricing.ts';
import { designRows } from '../server/sweeps/rows.ts';

const range = (n: number, f: (i: number) => number) => Array.from({ length: n }, (_, i) => f(i));

/** Just what the design rows read: counts, aperture, EIRP and the conducted power the model prices. */
function metrics(design: Record<string, unknown>, i: number): Record<string, unknown> {
  const nx = design.nx as number;
  const ny = design.ny as number;
  const n = nx * ny;
  return {
    channels: n, apertureXMm: nx * (design.dxMm as number), apertureYMm: ny * (design.dyMm as number),
    eirpDbm: 10 + 20 * Math.log10(n) + (i % 7) * 0.1, scanLossDb: (i % 5) * 0.3, conductedPowerDbm: 10 + 10 * Math.log10(n),
    gratingLobeVisible: false, codes: null, warnings: [],
  };
}

async function fill(db: DataSource, sweepId: string): Promise<number> {
  const grid = { frequencyGHz: range(10, (i) => 24 + i), nx: range(10, (i) => 4 + i), ny: range(10, (i) => 1 + i), dxMm: range(10, (i) => 4 + i * 0.2), phaseBits: range(10, (i) => i + 1) };
  const g = compileGrid(SweepGridShapeSchema.parse(grid));
  for (let start = 0; start < g.points; start += 2000) {
    const points: PointResult[] = [];
    for (let i = start; i < Math.min(g.points, start + 2000); i++) {
      const p = g.pointAt(i);
      const design = { ny: 1, channelPowerDbm: 10, ...p.input, dyMm: p.input.dyMm ?? p.input.dxMm } as Record<string, unknown>;
      points.push({ index: i, designIndex: p.designIndex, angleIndex: p.angleIndex, design, metrics: metrics(design, i), error: null });
    }
    await db.query(`INSERT INTO sweep_designs SELECT * FROM jsonb_populate_recordset(NULL::sweep_designs, $1::jsonb)`, [
      JSON.stringify(designRows(sweepId, points, DEMO_COST_MODEL)),
    ]);
  }
  return g.points;
}

export async function run(): Promise<void> {
  const out = (s: string) => process.stdout.write(`${s}\n`);
  const dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-bench-cost-'));
  const cluster = await startCluster({ dataDir: dir, port: await freePort(), database: 'lobewise_bench', durable: false });
  const db = createDataSource(cluster.url, { poolSize: 2 });
  try {
    await db.initialize();
    await db.runMigrations({ transaction: 'each' });
    const [{ id: teamId }] = await db.query(`INSERT INTO teams (name) VALUES ('Bench team') RETURNING id`);
    const [{ id: userId }] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('bench@example.test', 'Bench', 'engineer', $1) RETURNING id`, [teamId]);
    const [{ id: studyId }] = await db.query(`INSERT INTO studies (team_id, owner_id, name) VALUES ($1, $2, 'Bench study') RETURNING id`, [teamId, userId]);
    await db.query(`INSERT INTO study_cost_models (study_id, model) VALUES ($1, $2::jsonb)`, [studyId, JSON.stringify(DEMO_COST_MODEL)]);
    const [{ id: sweepId }] = await db.query(
      `INSERT INTO sweeps (study_id, name, grid, points_total, points_done, designs_total, angles_per_design, chunks_total, engine_version, status, cost_model_version)
       VALUES ($1, 'B', '{}', 100000, 100000, 100000, 1, 1, 'bench', 'done', 1) RETURNING id`,
      [studyId],
    );
    let t = performance.now();
    const n = await fill(db, sweepId);
    await db.query('VACUUM ANALYZE');
    out(`inserted ${n.toLocaleString('en-US')} priced design rows in ${((performance.now() - t) / 1000).toFixed(1)} s`);

    const ms: number[] = [];
    for (let i = 0; i < 3; i++) {
      const model = { ...DEMO_COST_MODEL, chipPrice: DEMO_COST_MODEL.chipPrice + i + 1 };
      t = performance.now();
      await db.transaction((m) => repriceStudySweeps(m, studyId, { model, version: i + 2 }));
      ms.push(performance.now() - t);
    }
    ms.sort((a, b) => a - b);
    out(`re-pricing 100,000 designs after a model save (median of 3, one transaction each): ${(ms[1]! / 1000).toFixed(2)} s`);
    await db.query('VACUUM ANALYZE');

    const ctx = { db } as AppContext;
    const sweep = await db.getRepository(Sweep).findOneByOrFail({ id: sweepId });
    const time = async (label: string, q: Record<string, string>) => {
      const runs: number[] = [];
      let total = 0;
      for (let i = 0; i < 7; i++) {
        t = performance.now();
        total = (await listDesigns(ctx, sweep, DesignsQuerySchema.parse(q))).total;
        runs.push(performance.now() - t);
      }
      runs.sort((a, b) => a - b);
      out(`${label.padEnd(70)} ${runs[3]!.toFixed(1).padStart(7)} ms  (total ${total})`);
    };
    out('median of 7, each including the count(*) for the total and the cost basis:');
    await time('designs (100k): sort costUsd:asc (indexed)', { sort: 'costUsd:asc' });
    await time('designs (100k): sort dcPowerW:desc (indexed)', { sort: 'dcPowerW:desc' });
    await time('designs (100k): filter costUsd ..60, heatWPerCm2 ..0.5; sort peakEirpDbm:desc', { 'filter[costUsd]': '..60', 'filter[heatWPerCm2]': '..0.5', sort: 'peakEirpDbm:desc' });
    await time('designs (100k): page at offset 90,000, sort beamformerChips:asc', { offset: '90000', sort: 'beamformerChips:asc' });
  } finally {
    if (db.isInitialized) await db.destroy();
    await cluster.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}
