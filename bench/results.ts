/**
 * `npm run bench -- results`: times the results API's queries at 100,000 rows in a throw-away PostgreSQL.
 * Sweep A: 100,000 points (10,000 designs × 10 angles); sweep B: 100,000 designs (one angle each), as the
 * trade table reads them. Metrics are synthetic (seeded), parameters come from real grids; only query time matters.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { PointResult } from '../shared/sweep/chunk.ts';
import { compileGrid } from '../shared/sweep/grid.ts';
import { SweepGridShapeSchema } from '../shared/sweep/grid-schema.ts';
import { DesignsQuerySchema, PointsQuerySchema } from '../shared/sweep/results-query.ts';
import type { AppContext } from '../server/context.ts';
import { startCluster } from '../server/db/cluster.ts';
import { freePort } from '../server/db/free-port.ts';
import { createDataSource } from '../server/data-source.ts';
import { Sweep } from '../server/entities/sweep.ts';
import { listDesigns, listPoints } from '../server/services/sweep-results.ts';
import { designRows, pointRow } from '../server/sweeps/rows.ts';

/** Small seeded generator (mulberry32) so every run stores the same rows. */
function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function fakeMetrics(r: () => number, design: Record<string, unknown>): Record<string, unknown> {
  const nx = design.nx as number;
  const ny = design.ny as number;
  const dir = 10 * Math.log10(nx * ny) + 3 + r();
  return {
    peakAzDeg: (design.steerAzDeg as number) - r(), peakElDeg: 0, pointingErrorDeg: r(),
    hpbwAzDeg: 100 / nx + r() * 5, hpbwElDeg: 100 / ny + r() * 5, hpbwAzClipped: r() < 0.05, hpbwElClipped: false,
    sllAzDb: -10 - r() * 30, sllElDb: ny > 1 ? -10 - r() * 30 : null, peakSllDb: -10 - r() * 20,
    directivityDbi: dir, scanLossDb: r() * 4, taperEfficiencyDb: -r(), gratingLobeOnsetAzDeg: 90 * r(),
    gratingLobeOnsetElDeg: ny > 1 ? 90 * r() : null, gratingLobeVisible: r() < 0.1, channels: nx * ny,
    apertureXMm: nx * (design.dxMm as number), apertureYMm: ny * (design.dyMm as number), codes: null,
    eirpDbm: 10 + 10 * Math.log10(nx * ny) + dir, warnings: [],
  };
}

async function fill(db: DataSource, sweepId: string, gridInput: unknown, seed: number): Promise<number> {
  const g = compileGrid(SweepGridShapeSchema.parse(gridInput));
  const r = rng(seed);
  const BATCH = 2000; // whole designs per batch (anglesPerDesign divides it)
  for (let start = 0; start < g.points; start += BATCH) {
    const points: PointResult[] = [];
    for (let i = start; i < Math.min(g.points, start + BATCH); i++) {
      const p = g.pointAt(i);
      const design = { ny: 1, channelPowerDbm: 10, ...p.input, dyMm: p.input.dyMm ?? p.input.dxMm } as Record<string, unknown>;
      points.push({ index: i, designIndex: p.designIndex, angleIndex: p.angleIndex, design, metrics: fakeMetrics(r, design), error: null });
    }
    await db.query(`INSERT INTO sweep_points SELECT * FROM jsonb_populate_recordset(NULL::sweep_points, $1::jsonb)`, [JSON.stringify(points.map((p) => pointRow(sweepId, p)))]);
    await db.query(`INSERT INTO sweep_designs SELECT * FROM jsonb_populate_recordset(NULL::sweep_designs, $1::jsonb)`, [JSON.stringify(designRows(sweepId, points))]);
  }
  return g.points;
}

const range = (n: number, f: (i: number) => number) => Array.from({ length: n }, (_, i) => f(i));

export async function run(): Promise<void> {
  const out = (s: string) => process.stdout.write(`${s}\n`);
  const dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-bench-results-'));
  const cluster = await startCluster({ dataDir: dir, port: await freePort(), database: 'lobewise_bench', durable: false });
  const db = createDataSource(cluster.url, { poolSize: 2 });
  try {
    await db.initialize();
    await db.runMigrations({ transaction: 'each' });
    const [{ id: teamId }] = await db.query(`INSERT INTO teams (name) VALUES ('Bench team') RETURNING id`);
    const [{ id: userId }] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('bench@example.test', 'Bench', 'engineer', $1) RETURNING id`, [teamId]);
    const [{ id: studyId }] = await db.query(`INSERT INTO studies (team_id, owner_id, name) VALUES ($1, $2, 'Bench study') RETURNING id`, [teamId, userId]);
    const mk = async (name: string, points: number, designs: number, angles: number) =>
      (await db.query(
        `INSERT INTO sweeps (study_id, name, grid, points_total, points_done, designs_total, angles_per_design, chunks_total, engine_version, status)
         VALUES ($1, $2, '{}', $3, $3, $4, $5, 1, 'bench', 'done') RETURNING id`,
        [studyId, name, points, designs, angles],
      ))[0].id as string;

    // A: 10 × 10 × 10 × 10 designs × 10 angles = 100,000 points.
    const gridA = { frequencyGHz: range(10, (i) => 24 + i), nx: range(10, (i) => 4 + i), ny: range(10, (i) => 1 + i), dxMm: range(10, (i) => 4 + i * 0.2), steerAzDeg: range(10, (i) => i * 6) };
    // B: 100,000 designs of one angle each.
    const gridB = { frequencyGHz: range(10, (i) => 24 + i), nx: range(10, (i) => 4 + i), ny: range(10, (i) => 1 + i), dxMm: range(10, (i) => 4 + i * 0.2), phaseBits: range(10, (i) => i + 1) };
    const a = await mk('A', 100_000, 10_000, 10);
    const b = await mk('B', 100_000, 100_000, 1);
    let t = performance.now();
    await fill(db, a, gridA, 1);
    await fill(db, b, gridB, 2);
    await db.query('VACUUM ANALYZE'); // as autovacuum would: visibility map set, statistics fresh
    out(`inserted 200,000 point rows and 110,000 design rows in ${((performance.now() - t) / 1000).toFixed(1)} s`);

    const ctx = { db } as AppContext;
    const sweepA = await db.getRepository(Sweep).findOneByOrFail({ id: a });
    const sweepB = await db.getRepository(Sweep).findOneByOrFail({ id: b });
    const time = async (label: string, fn: () => Promise<{ total: number }>) => {
      const ms: number[] = [];
      let total = 0;
      for (let i = 0; i < 7; i++) {
        t = performance.now();
        total = (await fn()).total;
        ms.push(performance.now() - t);
      }
      ms.sort((x, y) => x - y);
      out(`${label.padEnd(78)} ${ms[3]!.toFixed(1).padStart(7)} ms  (total ${total})`);
    };
    out('median of 7, each including the count(*) for the total:');
    const P = (q: Record<string, string>) => () => listPoints(ctx, sweepA, PointsQuerySchema.parse(q));
    const D = (q: Record<string, string>) => () => listDesigns(ctx, sweepB, DesignsQuerySchema.parse(q));
    await time('points (100k): first page of 100, point order', P({}));
    await time('points (100k): sort directivityDbi:desc (indexed)', P({ sort: 'directivityDbi:desc' }));
    await time('points (100k): sort scanLossDb:asc (indexed)', P({ sort: 'scanLossDb:asc' }));
    await time('points (100k): sort sllAzDb:asc (not indexed)', P({ sort: 'sllAzDb:asc' }));
    await time('points (100k): filter nx=8..12, peakSllDb ..-20; sort eirpDbm:desc', P({ 'filter[nx]': '8..12', 'filter[peakSllDb]': '..-20', sort: 'eirpDbm:desc' }));
    await time('points (100k): page at offset 50,000, sort hpbwAzDeg:asc', P({ offset: '50000', sort: 'hpbwAzDeg:asc' }));
    await time('points (100k): one design expanded (designIndex=4321)', P({ designIndex: '4321' }));
    await time('designs (100k): sort scanLossEdgeDb:asc', D({ sort: 'scanLossEdgeDb:asc' }));
    await time('designs (100k): sort worstSllDb:desc', D({ sort: 'worstSllDb:desc' }));
    await time('designs (100k): filter channels ..32, peakEirpDbm 40..; sort hpbwAzMaxDeg:asc', D({ 'filter[channels]': '..32', 'filter[peakEirpDbm]': '40..', sort: 'hpbwAzMaxDeg:asc' }));
    await time('designs (100k): filter apertureXMm ..40 (JSON filters); sort edgeEirpDbm:desc', D({ filters: '{"apertureXMm":{"max":40}}', sort: 'edgeEirpDbm:desc' }));
    await time('designs (100k): page at offset 90,000, sort directivityMaxDbi:asc', D({ offset: '90000', sort: 'directivityMaxDbi:asc' }));
    // Sweep A's 10,000 designs judged over a target sheet's scan window: worst cases recomputed from its points.
    const W = (q: Record<string, string>) => () => listDesigns(ctx, sweepA, DesignsQuerySchema.parse(q));
    await time('designs (10k × 10 angles): scanAz=0..30; sort scanLossEdgeDb:desc', W({ scanAz: '0..30', sort: 'scanLossEdgeDb:desc' }));
    await time('designs (10k × 10 angles): scanAz=0..54, filter channels ..32; sort edgeEirpDbm:desc', W({ scanAz: '0..54', 'filter[channels]': '..32', sort: 'edgeEirpDbm:desc' }));
  } finally {
    if (db.isInitialized) await db.destroy();
    await cluster.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}
