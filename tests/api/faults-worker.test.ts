/**
 * A stand-alone sweep worker (`server/worker-main.ts`, what `npm run worker` runs) SIGKILLed while it holds
 * a chunk: another worker that keeps running takes its chunks over without any restart, and the sweep ends
 * with every point exactly once. (tests/api/sweeps-processes.test.ts covers the server killed and started
 * again; tests/api/sweeps-crash.test.ts a worker thread crashing inside a live process.)
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { Study } from '../../server/entities/study.ts';
import { createSweep } from '../../server/services/sweep-service.ts';
import { startSweepRunner, type SweepRunner } from '../../server/sweeps/runner.ts';
import { SweepRequestSchema } from '../../shared/sweep/request.ts';
import { seedTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

/** 48 designs × 31 angles = 1,488 points in several chunks: seconds on one thread, so there is a middle to kill in. */
const GRID = {
  frequencyGHz: 28,
  nx: [8, 16],
  ny: [4, 8],
  dxMm: [5, 5.35, 5.9],
  taperX: [{ kind: 'uniform' }, { kind: 'hamming' }, { kind: 'chebyshev', sllDb: 30 }, { kind: 'hann' }],
  steerAzDeg: Array.from({ length: 31 }, (_, i) => i * 2),
};

let ctx: AppContext;
let worker: ChildProcess | undefined;
let survivor: SweepRunner | undefined;

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function until<T>(what: string, read: () => Promise<T>, ok: (v: T) => boolean, timeoutMs = 90_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await read();
    if (ok(v)) return v;
    if (Date.now() > deadline) throw new Error(`${what}: still ${JSON.stringify(v)}`);
    await sleep(50);
  }
}

function startWorkerProcess(): Promise<{ child: ChildProcess; workerId: string }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker-main.ts'], {
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), SWEEP_THREADS: '1', SWEEP_RECOVERY_SECONDS: '0.5', LOG_LEVEL: 'silent' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  let err = '';
  child.stderr!.on('data', (d) => (err += String(d)));
  return new Promise((resolve, reject) => {
    child.stdout!.on('data', (d) => {
      out += String(d);
      const m = /sweep worker (\S+) running/.exec(out);
      if (m) resolve({ child, workerId: m[1]! });
    });
    child.once('exit', (code) => reject(new Error(`worker exited with ${code}: ${err}`)));
  });
}

const chunks = async (id: string) =>
  (await ctx.db.query(`SELECT chunk_index, status, claimed_by, worker_id FROM sweep_chunks WHERE sweep_id = $1 ORDER BY chunk_index`, [id])) as {
    chunk_index: number;
    status: string;
    claimed_by: string | null;
    worker_id: string | null;
  }[];

beforeAll(async () => {
  ctx = await openTestContext(); // no runner of its own until the survivor starts
  await truncateAll(ctx.db);
});
afterAll(async () => {
  if (worker && worker.exitCode === null && worker.signalCode === null) worker.kill('SIGKILL');
  await survivor?.stop();
  await ctx?.db.destroy();
});

describe('a stand-alone worker killed mid-sweep', { timeout: 180_000 }, () => {
  it('has its chunks taken over by a live worker; the sweep ends with exactly pointsTotal rows, no duplicates', async () => {
    const team = await seedTeam(ctx.db);
    const study = await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Worker fault' });
    const started = await startWorkerProcess();
    worker = started.child;
    const { id, pointsTotal } = await createSweep(ctx, team.engineer, study.id, SweepRequestSchema.parse({ name: 'killed worker', grid: GRID }));
    expect(pointsTotal).toBe(48 * 31);

    // Kill it while it holds a chunk, after it has written at least one. The worker is frozen (SIGSTOP) before
    // the chunks are read, so it cannot finish the chunk it holds between the look and the kill.
    let held: number[] = [];
    let atKill: Awaited<ReturnType<typeof chunks>> = [];
    for (let attempt = 0; attempt < 50 && held.length === 0; attempt++) {
      await until('the worker to finish one chunk and hold another', () => chunks(id), (cs) =>
        cs.some((c) => c.status === 'done' && c.worker_id === started.workerId) && cs.some((c) => c.status === 'pending' && c.claimed_by === started.workerId),
      );
      worker.kill('SIGSTOP');
      atKill = await chunks(id);
      // Claimed by a process that will no longer exist: only a take-over can finish these.
      held = atKill.filter((c) => c.status === 'pending' && c.claimed_by === started.workerId).map((c) => c.chunk_index);
      if (held.length === 0) worker.kill('SIGCONT');
    }
    expect(held.length).toBeGreaterThan(0);
    const exited = new Promise((r) => worker!.once('exit', r));
    worker.kill('SIGKILL');
    await exited;
    const doneByKilled = atKill.filter((c) => c.status === 'done' && c.worker_id === started.workerId).map((c) => c.chunk_index);
    const [{ points_done: doneAtKill }] = (await ctx.db.query(`SELECT points_done FROM sweeps WHERE id = $1`, [id])) as [{ points_done: number }];
    expect(doneAtKill).toBeLessThan(pointsTotal);

    // Another worker, alive the whole time from here on, notices the dead one's lock is gone and finishes.
    survivor = await startSweepRunner({ db: ctx.db, url: inject('databaseUrl'), log: ctx.log, threads: 1, embedded: false, recoverEverySeconds: 0.5 });
    await until('the sweep to finish', async () => ((await ctx.db.query(`SELECT status FROM sweeps WHERE id = $1`, [id])) as [{ status: string }])[0].status, (s) => s === 'done');

    const [counts] = (await ctx.db.query(
      `SELECT count(*)::int AS n, count(DISTINCT point_index)::int AS distinct, count(*) FILTER (WHERE error IS NOT NULL)::int AS failed,
              min(point_index)::int AS first, max(point_index)::int AS last
       FROM sweep_points WHERE sweep_id = $1`,
      [id],
    )) as [{ n: number; distinct: number; failed: number; first: number; last: number }];
    expect(counts).toEqual({ n: pointsTotal, distinct: pointsTotal, failed: 0, first: 0, last: pointsTotal - 1 });
    const after = await chunks(id);
    expect(after.every((c) => c.status === 'done' && c.claimed_by === null)).toBe(true);
    // The chunk the dead worker held was finished by the survivor; what it had written stays its own.
    for (const index of held) expect(after[index]!.worker_id).toBe(survivor.workerId);
    for (const index of doneByKilled) expect(after[index]!.worker_id).toBe(started.workerId);
    const [{ points_done: pointsDone }] = (await ctx.db.query(`SELECT points_done FROM sweeps WHERE id = $1`, [id])) as [{ points_done: number }];
    expect(pointsDone).toBe(pointsTotal);
  });
});
