import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { createSweepPool } from '../../server/sweeps/pool.ts';
import { startSweepRunner } from '../../server/sweeps/runner.ts';
import { createSweep } from '../../server/services/sweep-service.ts';
import { SweepRequestSchema } from '../../shared/sweep/request.ts';
import { SweepGridShapeSchema } from '../../shared/sweep/grid-schema.ts';
import { compileGrid } from '../../shared/sweep/grid.ts';
import { evaluateRange } from '../../shared/sweep/evaluate-range.ts';
import { seedTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

const CRASHING_WORKER = fileURLToPath(new URL('../fixtures/sweep/crash-once-worker.ts', import.meta.url));
const GRID = { frequencyGHz: 28, nx: [4, 8], dxMm: 5.35, taperX: [{ kind: 'uniform' }, { kind: 'hamming' }], steerAzDeg: [0, 20, 40] };

let dir: string;
let ctx: AppContext;
beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-crash-'));
  ctx = await openTestContext();
  await truncateAll(ctx.db);
});
afterAll(async () => {
  delete process.env.LOBEWISE_CRASH_MARKER;
  await ctx?.db.destroy();
  rmSync(dir, { recursive: true, force: true });
});

describe('a worker thread that crashes', () => {
  it('is replaced and its chunk retried, with the same rows as a direct evaluation', async () => {
    process.env.LOBEWISE_CRASH_MARKER = path.join(dir, 'pool-crashed');
    const pool = createSweepPool({ threads: 1, filename: CRASHING_WORKER });
    try {
      const grid = SweepGridShapeSchema.parse(GRID);
      const rows = await pool.run({ gridKey: 'g', grid, constraints: {}, start: 0, end: 12 });
      expect(existsSync(process.env.LOBEWISE_CRASH_MARKER)).toBe(true); // it did crash
      expect(pool.retries).toBe(1);
      expect(rows).toEqual(evaluateRange(compileGrid(grid), 0, 12));
      // The replacement thread keeps serving.
      expect(await pool.run({ gridKey: 'g', grid, constraints: {}, start: 3, end: 5 })).toHaveLength(2);
    } finally {
      await pool.destroy();
    }
  });

  it('does not lose or duplicate points of a sweep run by the queue', async () => {
    process.env.LOBEWISE_CRASH_MARKER = path.join(dir, 'runner-crashed');
    const team = await seedTeam(ctx.db);
    const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Crash study' });
    const runner = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 2, embedded: true, workerFile: CRASHING_WORKER, recoverEverySeconds: 1 });
    try {
      const { id, pointsTotal } = await createSweep({ ...ctx, sweeps: runner }, team.engineer, study.id, SweepRequestSchema.parse({ name: 'crash', grid: GRID }));
      const deadline = Date.now() + 30_000;
      let status = '';
      while (status !== 'done' && Date.now() < deadline) {
        await new Promise((r) => setTimeout(r, 200));
        [{ status }] = await ctx.db.query(`SELECT status FROM sweeps WHERE id = $1`, [id]);
      }
      expect(status).toBe('done');
      expect(runner.pool.retries).toBe(1);
      const [{ n, distinct }] = await ctx.db.query(
        `SELECT count(*)::int AS n, count(DISTINCT point_index)::int AS distinct FROM sweep_points WHERE sweep_id = $1 AND error IS NULL`,
        [id],
      );
      expect(n).toBe(pointsTotal);
      expect(distinct).toBe(pointsTotal);
    } finally {
      await runner.stop();
    }
  });
});
