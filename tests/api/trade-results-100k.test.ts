/**
 * The trade table's server side at 100,000 rows: paging, sorting and filtering of the results and designs APIs
 * return exactly the rows a direct computation gives. Correctness only; the sort and filter times are printed
 * (console.info) for the record, not asserted.
 */
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

const POINTS = 100_000;
const ANGLES = 4;
const DESIGNS = 100_000;
const BATCH = 5_000;

let ctx: AppContext;
let app: Express;
let engineer: AuthedClient;
let outsider: AuthedClient;
let pointSweep: string;
let designSweep: string;

/** Deterministic synthetic values: integer arithmetic, so JS and the stored doubles agree exactly. */
const hpbw = (i: number) => 10 + ((i * 7919) % 1000) / 20; // 10 … 59.95
const scanLoss = (i: number) => ((i * 104729) % 5000) / 1000; // 0 … 4.999
const sll = (i: number) => (i % 97 === 0 ? null : -30 + ((i * 31) % 200) / 10); // some nulls: no side lobe
const channels = (d: number) => [2, 4, 6, 8, 16, 32][d % 6]!;
const edgeEirp = (d: number) => ((d * 7741) % 30000) / 1000; // 0 … 29.999

interface Pt { index: number; designIndex: number; angleIndex: number; hpbwAzDeg: number; scanLossDb: number; peakSllDb: number | null }
interface Ds { designIndex: number; channels: number; edgeEirpDbm: number }

const points: Pt[] = Array.from({ length: POINTS }, (_, i) => ({
  index: i, designIndex: Math.floor(i / ANGLES), angleIndex: i % ANGLES, hpbwAzDeg: hpbw(i), scanLossDb: scanLoss(i), peakSllDb: sll(i),
}));
const designs: Ds[] = Array.from({ length: DESIGNS }, (_, d) => ({ designIndex: d, channels: channels(d), edgeEirpDbm: edgeEirp(d) }));

async function insertSweep(studyId: string, userId: string, name: string, pointsTotal: number, designsTotal: number): Promise<string> {
  const [row] = (await ctx.db.query(
    `INSERT INTO sweeps (study_id, name, grid, status, points_total, points_done, designs_total, angles_per_design, chunks_total, engine_version, created_by)
     VALUES ($1, $2, '{}', 'done', $3, $3, $4, $5, 0, 'test', $6) RETURNING id`,
    [studyId, name, pointsTotal, designsTotal, pointsTotal / designsTotal, userId],
  )) as { id: string }[];
  return row!.id;
}

/** Batched multi-row inserts: one JSON array per statement, expanded by PostgreSQL. */
async function insertRows(table: string, rows: Record<string, unknown>[]): Promise<void> {
  for (let i = 0; i < rows.length; i += BATCH) {
    await ctx.db.query(`INSERT INTO ${table} SELECT * FROM jsonb_populate_recordset(NULL::${table}, $1::jsonb)`, [JSON.stringify(rows.slice(i, i + BATCH))]);
  }
}

/** ORDER BY value (nulls last), then index, as a trade table user expects for ties. */
function sortBy<T>(rows: T[], value: (r: T) => number | null, index: (r: T) => number, dir: 'asc' | 'desc'): T[] {
  const s = dir === 'asc' ? 1 : -1;
  return [...rows].sort((a, b) => {
    const va = value(a);
    const vb = value(b);
    if (va === null || vb === null) return va === vb ? index(a) - index(b) : va === null ? 1 : -1;
    return va !== vb ? s * (va - vb) : index(a) - index(b);
  });
}

async function timed<T>(label: string, run: () => Promise<T>): Promise<T> {
  const t0 = performance.now();
  const out = await run();
  console.info(`[trade-100k] ${label}: ${(performance.now() - t0).toFixed(1)} ms`);
  return out;
}

beforeAll(async () => {
  ctx = await openTestContext();
  await truncateAll(ctx.db);
  app = createApp(ctx);
  const team = await seedTeam(ctx.db);
  const other = await seedTeam(ctx.db);
  engineer = await authed(app, team.engineer);
  outsider = await authed(app, other.engineer);
  const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Trade at scale' });
  pointSweep = await insertSweep(study.id, team.engineer.id, 'points', POINTS, POINTS / ANGLES);
  designSweep = await insertSweep(study.id, team.engineer.id, 'designs', DESIGNS, DESIGNS);
  await insertRows(
    'sweep_points',
    points.map((p) => ({
      sweep_id: pointSweep, point_index: p.index, design_index: p.designIndex, angle_index: p.angleIndex,
      steer_az_deg: p.angleIndex * 15, design: { steerAzDeg: p.angleIndex * 15 },
      hpbw_az_deg: p.hpbwAzDeg, scan_loss_db: p.scanLossDb, peak_sll_db: p.peakSllDb,
    })),
  );
  await insertRows(
    'sweep_designs',
    designs.map((d) => ({
      sweep_id: designSweep, design_index: d.designIndex, design: { nx: d.channels }, angles: 1, points_failed: 0,
      channels: d.channels, edge_eirp_dbm: d.edgeEirpDbm,
    })),
  );
  await ctx.db.query('ANALYZE sweep_points');
  await ctx.db.query('ANALYZE sweep_designs');
}, 300_000);

afterAll(async () => {
  await ctx?.db.destroy();
});

describe('GET /api/sweeps/:id/results at 100,000 points', () => {
  it('stores exactly 100,000 points (direct SQL count)', async () => {
    const [{ n }] = (await ctx.db.query('SELECT count(*)::int AS n FROM sweep_points WHERE sweep_id = $1', [pointSweep])) as [{ n: number }];
    expect(n).toBe(POINTS);
  });

  it('sorts by side-lobe level descending with nulls last, first page and last page', async () => {
    const expected = sortBy(points, (p) => p.peakSllDb, (p) => p.index, 'desc');
    const first = await timed('results sort peakSllDb desc, first page', () =>
      engineer.get(`/api/sweeps/${pointSweep}/results?sort=peakSllDb:desc&offset=0&limit=100`),
    );
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(POINTS);
    expect(first.body.rows.map((r: { index: number }) => r.index)).toEqual(expected.slice(0, 100).map((p) => p.index));
    const last = await timed('results sort peakSllDb desc, last page', () =>
      engineer.get(`/api/sweeps/${pointSweep}/results?sort=peakSllDb:desc&offset=${POINTS - 50}&limit=100`),
    );
    expect(last.body.rows.map((r: { index: number }) => r.index)).toEqual(expected.slice(POINTS - 50).map((p) => p.index));
    // The tail is the points without a side lobe (null), in index order.
    expect(last.body.rows.every((r: { index: number }) => r.index % 97 === 0)).toBe(true);
  });

  it('filters by an HPBW range and a scan-loss bound, sorted by scan loss, paging through the middle', async () => {
    const keep = points.filter((p) => p.hpbwAzDeg >= 20 && p.hpbwAzDeg <= 25 && p.scanLossDb <= 1.5);
    const expected = sortBy(keep, (p) => p.scanLossDb, (p) => p.index, 'asc');
    const filters = encodeURIComponent(JSON.stringify({ hpbwAzDeg: { min: 20, max: 25 }, scanLossDb: { max: 1.5 } }));
    const res = await timed('results filter hpbwAzDeg 20..25 & scanLossDb <= 1.5, sorted, offset 1000', () =>
      engineer.get(`/api/sweeps/${pointSweep}/results?filters=${filters}&sort=scanLossDb:asc&offset=1000&limit=200`),
    );
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(keep.length);
    expect(res.body.rows.map((r: { index: number }) => r.index)).toEqual(expected.slice(1000, 1200).map((p) => p.index));
    // Cross-check the count against a direct SQL computation over the same rows.
    const [{ n }] = (await ctx.db.query(
      `SELECT count(*)::int AS n FROM sweep_points WHERE sweep_id = $1 AND hpbw_az_deg BETWEEN 20 AND 25 AND scan_loss_db <= 1.5`,
      [pointSweep],
    )) as [{ n: number }];
    expect(res.body.total).toBe(n);
  });

  it('returns one design\'s points in angle order (the expanded trade-table row)', async () => {
    const res = await engineer.get(`/api/sweeps/${pointSweep}/results?designIndex=12345&sort=angleIndex:asc&limit=1000`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(ANGLES);
    expect(res.body.rows.map((r: { index: number }) => r.index)).toEqual([49380, 49381, 49382, 49383]);
  });
});

describe('GET /api/sweeps/:id/designs at 100,000 designs', () => {
  it('sorts by EIRP at edge of scan within a channel range, the trade table\'s main question', async () => {
    const keep = designs.filter((d) => d.channels >= 4 && d.channels <= 8);
    const expected = sortBy(keep, (d) => d.edgeEirpDbm, (d) => d.designIndex, 'desc');
    const filters = encodeURIComponent(JSON.stringify({ channels: { min: 4, max: 8 } }));
    const res = await timed('designs filter channels 4..8, sort edgeEirpDbm desc', () =>
      engineer.get(`/api/sweeps/${designSweep}/designs?filters=${filters}&sort=edgeEirpDbm:desc&offset=0&limit=100`),
    );
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(keep.length);
    expect(res.body.rows.map((r: { designIndex: number }) => r.designIndex)).toEqual(expected.slice(0, 100).map((d) => d.designIndex));
    expect(res.body.rows.every((r: { channels: number }) => r.channels >= 4 && r.channels <= 8)).toBe(true);
  });

  it('sorts the whole table ascending and pages deep into it', async () => {
    const expected = sortBy(designs, (d) => d.edgeEirpDbm, (d) => d.designIndex, 'asc');
    const res = await timed('designs sort edgeEirpDbm asc, offset 60000', () =>
      engineer.get(`/api/sweeps/${designSweep}/designs?sort=edgeEirpDbm:asc&offset=60000&limit=100`),
    );
    expect(res.body.total).toBe(DESIGNS);
    expect(res.body.rows.map((r: { designIndex: number }) => r.designIndex)).toEqual(expected.slice(60000, 60100).map((d) => d.designIndex));
  });

  it('answers an exact-value filter with the matching count', async () => {
    const res = await timed('designs filter channels = 16', () => engineer.get(`/api/sweeps/${designSweep}/designs?filter[channels]=16&limit=10`));
    expect(res.body.total).toBe(designs.filter((d) => d.channels === 16).length);
  });

  it('refuses an unknown sort field with a 400 naming it', async () => {
    const res = await engineer.get(`/api/sweeps/${designSweep}/designs?sort=noSuchField:asc`);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/sort/);
  });

  it('hides another team\'s sweep (404)', async () => {
    const res = await outsider.get(`/api/sweeps/${designSweep}/designs?limit=1`);
    expect(res.status).toBe(404);
  });
});
