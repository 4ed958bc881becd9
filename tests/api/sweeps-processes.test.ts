/**
 * Sweeps across processes against the real PostgreSQL: a stand-alone worker (`npm run worker`) takes part
 * beside a server, and a server killed mid-sweep (SIGKILL) and started again finishes with every point once.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { afterAll, afterEach, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppContext } from '../../server/context.ts';
import { freePort } from '../../server/db/free-port.ts';
import { Study } from '../../server/entities/study.ts';
import { createSweep } from '../../server/services/sweep-service.ts';
import { SweepRequestSchema } from '../../shared/sweep/request.ts';
import { seedTeam, type SeededTeam } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

/** 96 designs × 31 angles = 2,976 points in 12 chunks: a few seconds on one thread. */
const GRID = {
  frequencyGHz: 28,
  nx: [8, 16],
  ny: [4, 8],
  dxMm: [5, 5.35, 5.9],
  taperX: [{ kind: 'uniform' }, { kind: 'hamming' }, { kind: 'hann' }, { kind: 'chebyshev', sllDb: 30 }],
  phaseBits: [null, 4],
  steerAzDeg: Array.from({ length: 31 }, (_, i) => i * 2),
};

let ctx: AppContext;
let team: SeededTeam;
let studyId: string;
const children: ChildProcess[] = [];

interface Proc {
  child: ChildProcess;
  /** Resolves with the first stdout line matching `re`. */
  line(re: RegExp): Promise<RegExpMatchArray>;
}

async function start(cmd: string, args: string[], env: Record<string, string>): Promise<Proc> {
  const child = spawn(cmd, args, {
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), SWEEP_THREADS: '1', SWEEP_RECOVERY_SECONDS: '0.5', LOG_LEVEL: 'silent', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true, // own process group: npm's children are stopped with it
  });
  children.push(child);
  let out = '';
  let err = '';
  child.stderr!.on('data', (d) => (err += String(d)));
  return {
    child,
    line: (re) =>
      new Promise((resolve, reject) => {
        const onData = (d: Buffer) => {
          out += String(d);
          const m = out.match(re);
          if (m) {
            child.stdout!.off('data', onData);
            resolve(m);
          }
        };
        child.stdout!.on('data', onData);
        child.once('exit', (code) => reject(new Error(`${cmd} exited with ${code}: ${err}`)));
      }),
  };
}

function killGroup(child: ChildProcess, signal: NodeJS.Signals): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  try {
    process.kill(-child.pid!, signal);
  } catch {
    /* already gone */
  }
  return exited;
}

async function startServerProcess(): Promise<Proc> {
  const p = await start('node', ['--import', 'tsx', 'tests/fixtures/sweep/serve.ts'], {
    PORT: '0',
    SEED_DEMO: 'false',
    SMTP_FAKE_PORT: String(await freePort()),
    SESSION_SECRET: 'test-secret-0123456789',
  });
  await p.line(/listening /);
  return p;
}

async function newSweep(name: string) {
  return createSweep(ctx, team.engineer, studyId, SweepRequestSchema.parse({ name, grid: GRID }));
}

async function progress(id: string): Promise<{ status: string; points_done: number; points_total: number }> {
  const [row] = await ctx.db.query(`SELECT status, points_done, points_total FROM sweeps WHERE id = $1`, [id]);
  return row;
}

async function waitUntil(id: string, ok: (p: Awaited<ReturnType<typeof progress>>) => boolean, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const p = await progress(id);
    if (ok(p)) return p;
    if (Date.now() > deadline) throw new Error(`sweep ${id}: ${JSON.stringify(p)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function pointCounts(id: string) {
  const [row] = await ctx.db.query(
    `SELECT count(*)::int AS n, count(DISTINCT point_index)::int AS distinct, count(*) FILTER (WHERE error IS NOT NULL)::int AS failed
     FROM sweep_points WHERE sweep_id = $1`,
    [id],
  );
  return row as { n: number; distinct: number; failed: number };
}

beforeAll(async () => {
  ctx = await openTestContext(); // no runner here: the spawned processes do the work
  await truncateAll(ctx.db);
  team = await seedTeam(ctx.db);
  studyId = (await ctx.db.getRepository(Study).save({ teamId: team.team.id, ownerId: team.engineer.id, name: 'Scale-out' })).id;
});
afterEach(async () => {
  await Promise.all(children.splice(0).map((c) => killGroup(c, 'SIGKILL')));
});
afterAll(async () => {
  await ctx?.db.destroy();
});

describe('a second worker process', { timeout: 180_000 }, () => {
  it('started with `npm run worker` takes part in a sweep beside the server', async () => {
    await startServerProcess();
    const worker = await start('npm', ['run', '--silent', 'worker'], {});
    const [, workerId] = await worker.line(/sweep worker (\S+) running/);
    const { id, pointsTotal } = await newSweep('two workers');
    await waitUntil(id, (p) => p.status === 'done');
    const byWorker = (await ctx.db.query(
      `SELECT c.worker_id, count(p.point_index)::int AS points FROM sweep_points p
       JOIN sweep_chunks c ON c.sweep_id = p.sweep_id AND p.point_index >= c.point_start AND p.point_index < c.point_end
       WHERE p.sweep_id = $1 GROUP BY c.worker_id`,
      [id],
    )) as { worker_id: string; points: number }[];
    expect(byWorker).toHaveLength(2);
    expect(byWorker.map((w) => w.worker_id)).toContain(workerId);
    for (const w of byWorker) expect(w.points).toBeGreaterThan(0);
    expect(byWorker.reduce((a, w) => a + w.points, 0)).toBe(pointsTotal);
    await killGroup(worker.child, 'SIGTERM');
  });
});

describe('a server killed mid-sweep', { timeout: 180_000 }, () => {
  it('resumes when started again and ends with every point exactly once', async () => {
    const first = await startServerProcess();
    const { id, pointsTotal } = await newSweep('restart');
    const before = await waitUntil(id, (p) => p.points_done > 0);
    await killGroup(first.child, 'SIGKILL');
    const atKill = await progress(id);
    expect(atKill.points_done).toBeLessThan(pointsTotal); // really mid-sweep
    expect(before.points_done).toBeGreaterThan(0);
    await startServerProcess();
    const done = await waitUntil(id, (p) => p.status === 'done');
    expect(done.points_done).toBe(pointsTotal);
    expect(await pointCounts(id)).toEqual({ n: pointsTotal, distinct: pointsTotal, failed: 0 });
    const [{ pending }] = await ctx.db.query(`SELECT count(*)::int AS pending FROM sweep_chunks WHERE sweep_id = $1 AND status <> 'done'`, [id]);
    expect(pending).toBe(0);
  });
});
