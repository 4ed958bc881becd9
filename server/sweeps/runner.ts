/**
 * A sweep worker: consumes the pg-boss queue of chunks with its own thread pool and writes results from
 * the main thread. The embedded server runs one; `npm run worker` runs another on any machine that
 * reaches the database. Each registers itself (sweep_workers) and holds an advisory lock while alive.
 */
import { randomBytes } from 'node:crypto';
import os from 'node:os';
import pg from 'pg';
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { DeviceSweepSpec } from '../../shared/devices/device-sweep-spec.ts';
import type { SweepConstraints, SweepGridShape } from '../../shared/sweep/grid-schema.ts';
import { createSweepPool, type SweepPool } from './pool.ts';
import { JOB_RETRY_LIMIT, SWEEP_QUEUE, recoverChunks, type ChunkJob } from './recovery.ts';
import { writeChunk } from './writer.ts';

export interface RunnerOptions {
  db: DataSource;
  /** Connection string for pg-boss and the liveness lock (the same database as `db`). */
  url: string;
  log: Logger;
  threads?: number;
  embedded: boolean;
  /** Worker thread file (tests swap in one that crashes). */
  workerFile?: string;
  /** How often to look for chunks nobody will run (new sweeps, dead workers). */
  recoverEverySeconds?: number;
}

export interface SweepRunner {
  readonly workerId: string;
  readonly pool: SweepPool;
  /** Sends the chunks of new sweeps to the queue now (instead of at the next recovery tick). */
  kick(): Promise<void>;
  stop(): Promise<void>;
}

/** Cached grid of a sweep (or, over a device, its spec): the thread pool compiles it once per thread from its key. */
interface SweepGridInfo {
  grid: SweepGridShape | null;
  constraints: SweepConstraints;
  device: DeviceSweepSpec | null;
}

const POLL_SECONDS = 0.5;
/** Grids kept per process: as many as each thread keeps compiled (workers/sweep.ts). */
const GRID_CACHE_SIZE = 8;

/** A sweep's grid by id, fetched once and kept for the GRID_CACHE_SIZE most recent sweeps. */
function sweepGridCache(db: DataSource): (sweepId: string) => Promise<SweepGridInfo> {
  const grids = new Map<string, SweepGridInfo>();
  return async (sweepId) => {
    let g = grids.get(sweepId);
    if (g) {
      grids.delete(sweepId);
    } else {
      const [row] = (await db.query(`SELECT grid, constraints, device FROM sweeps WHERE id = $1`, [sweepId])) as SweepGridInfo[];
      if (!row) throw new Error(`sweep ${sweepId} is gone`);
      g = row;
    }
    grids.set(sweepId, g);
    if (grids.size > GRID_CACHE_SIZE) grids.delete(grids.keys().next().value as string);
    return g;
  };
}

/** Registers the worker and takes its advisory lock on a dedicated connection, held for as long as it lives. */
async function registerWorker(o: RunnerOptions, workerId: string, threads: number): Promise<pg.Client> {
  const [{ lock_key: lockKey }] = (await o.db.query(
    `INSERT INTO sweep_workers (id, host, pid, threads, embedded) VALUES ($1, $2, $3, $4, $5) RETURNING lock_key`,
    [workerId, os.hostname(), process.pid, threads, o.embedded],
  )) as [{ lock_key: string }];
  const lockClient = new pg.Client({ connectionString: o.url });
  await lockClient.connect();
  lockClient.on('error', (err) => o.log.error({ err }, 'sweep worker lock connection lost'));
  await lockClient.query(`SELECT pg_advisory_lock($1)`, [lockKey]);
  return lockClient;
}

/** Claims one chunk, runs it on the pool and writes its points; a failure releases the chunk or, past the retries, fails the sweep. */
function chunkRunner(o: RunnerOptions, workerId: string, pool: SweepPool): (job: ChunkJob) => Promise<void> {
  const gridOf = sweepGridCache(o.db);
  return async ({ sweepId, chunkIndex }) => {
    // Claim: only a pending chunk of a live sweep that no live worker holds.
    const [claim] = (await o.db.query(
      `UPDATE sweep_chunks c SET claimed_by = $3, attempts = attempts + 1 FROM sweeps s
       WHERE c.sweep_id = $1 AND c.chunk_index = $2 AND s.id = c.sweep_id AND c.status = 'pending'
         AND c.claimed_by IS NULL AND s.status IN ('queued', 'running')
       RETURNING c.point_start, c.point_end, c.attempts`,
      [sweepId, chunkIndex, workerId],
    )) as [{ point_start: number; point_end: number; attempts: number }[], number];
    const row = Array.isArray(claim) ? claim[0] : undefined;
    if (!row) return;
    await o.db.query(`UPDATE sweeps SET status = 'running', started_at = COALESCE(started_at, now()), updated_at = now() WHERE id = $1 AND status = 'queued'`, [sweepId]);
    try {
      const { grid, constraints, device } = await gridOf(sweepId);
      const range = { gridKey: sweepId, start: row.point_start, end: row.point_end };
      const points = device ? await pool.runDevice({ ...range, device }) : await pool.run({ ...range, grid: grid!, constraints });
      await writeChunk(o.db, sweepId, chunkIndex, points, workerId, device ? 'device' : 'grid');
    } catch (err) {
      const final = row.attempts > JOB_RETRY_LIMIT;
      o.log.error({ err, sweepId, chunkIndex, attempt: row.attempts }, final ? 'sweep chunk failed for good' : 'sweep chunk failed; retrying');
      await o.db.query(`UPDATE sweep_chunks SET claimed_by = NULL, status = $3 WHERE sweep_id = $1 AND chunk_index = $2`, [sweepId, chunkIndex, final ? 'failed' : 'pending']);
      if (!final) throw err;
      await o.db.query(
        `UPDATE sweeps SET status = 'failed', error = $2, finished_at = now(), updated_at = now() WHERE id = $1 AND status IN ('queued', 'running')`,
        [sweepId, `chunk ${chunkIndex} failed: ${err instanceof Error ? err.message : String(err)}`],
      );
    }
  };
}

export async function startSweepRunner(o: RunnerOptions): Promise<SweepRunner> {
  const workerId = `${os.hostname()}:${process.pid}:${randomBytes(3).toString('hex')}`;
  const pool = createSweepPool({ threads: o.threads, filename: o.workerFile, onRetry: (err) => o.log.warn({ err }, 'sweep chunk retried after a worker thread failed') });
  const lockClient = await registerWorker(o, workerId, pool.threads);

  const boss = new PgBoss({ connectionString: o.url, max: 4, schedule: false, application_name: `lobewise-sweeps ${workerId}` });
  boss.on('error', (err) => o.log.error({ err }, 'sweep queue error'));
  await boss.start();
  await boss.createQueue(SWEEP_QUEUE, { name: SWEEP_QUEUE, retryLimit: JOB_RETRY_LIMIT });

  // One polling loop per thread plus one, so a thread has its next chunk while results are being written.
  const runChunk = chunkRunner(o, workerId, pool);
  const workIds: string[] = [];
  for (let i = 0; i <= pool.threads; i++) {
    workIds.push(
      await boss.work<ChunkJob>(SWEEP_QUEUE, { batchSize: 1, pollingIntervalSeconds: POLL_SECONDS }, async (jobs) => {
        for (const job of jobs) await runChunk(job.data);
      }),
    );
  }

  let recovering: Promise<void> | null = null;
  const kick = () =>
    (recovering ??= recoverChunks(o.db, boss)
      .then((sent) => {
        if (sent > 0) for (const id of workIds) boss.notifyWorker(id);
      })
      .catch((err: unknown) => o.log.error({ err }, 'sweep recovery failed'))
      .finally(() => {
        recovering = null;
      }));
  await kick();
  const timer = setInterval(() => void kick(), (o.recoverEverySeconds ?? 5) * 1000);
  timer.unref();

  let stopping: Promise<void> | undefined;
  const stop = () =>
    (stopping ??= (async () => {
      clearInterval(timer);
      await recovering;
      // Graceful: chunks in hand finish and are written; unstarted ones stay queued for others.
      await boss.stop({ graceful: true, wait: true, timeout: 30_000 });
      await pool.destroy();
      await lockClient.end().catch(() => undefined);
      await o.db.query(`DELETE FROM sweep_workers WHERE id = $1`, [workerId]).catch(() => undefined);
    })());

  return { workerId, pool, kick, stop };
}
