/**
 * Finds the chunks of unfinished sweeps that no live job will run and sends them (again) to the queue:
 * chunks of a new sweep (no job yet), chunks whose job ended or vanished, and chunks claimed by a worker
 * process that died. A worker is alive while it holds its advisory lock (PostgreSQL drops the lock the
 * moment the process's connection goes, so a killed process is noticed at once).
 */
import { randomUUID } from 'node:crypto';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';

export const SWEEP_QUEUE = 'sweep-chunks';
/** A chunk is retried this many times by the queue after the pool's own retries gave up. */
export const JOB_RETRY_LIMIT = 2;
/** A job held this long without finishing is taken back by pg-boss and retried. */
export const JOB_EXPIRE_SECONDS = 15 * 60;
/** Serialises recoveries of several processes (any constant; the workers' own keys are small serials). */
const RECOVERY_LOCK = 7_406_443_001;

export interface ChunkJob {
  sweepId: string;
  chunkIndex: number;
}

/** SQL: is the worker `claimed` alive (holding its advisory lock)? */
const LIVE_WORKER = `EXISTS (
  SELECT 1 FROM sweep_workers w JOIN pg_locks l
    ON l.locktype = 'advisory' AND l.granted AND l.classid = 0 AND l.objsubid = 1 AND l.objid::bigint = w.lock_key
  WHERE w.id = c.claimed_by)`;

export async function recoverChunks(db: DataSource, boss: PgBoss, limit = 5000): Promise<number> {
  const qr = db.createQueryRunner();
  await qr.connect();
  try {
    await qr.startTransaction();
    const [{ got }] = (await qr.query(`SELECT pg_try_advisory_xact_lock($1) AS got`, [RECOVERY_LOCK])) as [{ got: boolean }];
    if (!got) {
      await qr.rollbackTransaction();
      return 0;
    }
    const stale = (await qr.query(
      `SELECT c.sweep_id, c.chunk_index FROM sweep_chunks c JOIN sweeps s ON s.id = c.sweep_id
       LEFT JOIN pgboss.job j ON j.id = c.job_id AND j.name = $1
       WHERE s.status IN ('queued', 'running') AND c.status = 'pending'
         AND (c.job_id IS NULL
           OR (c.claimed_by IS NOT NULL AND NOT ${LIVE_WORKER})
           OR (c.claimed_by IS NULL AND (j.state IS NULL OR j.state NOT IN ('created', 'retry', 'active'))))
       ORDER BY s.created_at, c.chunk_index LIMIT $2`,
      [SWEEP_QUEUE, limit],
    )) as { sweep_id: string; chunk_index: number }[];
    if (stale.length === 0) {
      await qr.commitTransaction();
      return 0;
    }
    const jobs = stale.map((c) => ({ id: randomUUID(), sweepId: c.sweep_id, chunkIndex: c.chunk_index }));
    await qr.query(
      `UPDATE sweep_chunks c SET job_id = x.id, claimed_by = NULL
       FROM jsonb_to_recordset($1::jsonb) AS x(id uuid, "sweepId" uuid, "chunkIndex" int)
       WHERE c.sweep_id = x."sweepId" AND c.chunk_index = x."chunkIndex"`,
      [JSON.stringify(jobs)],
    );
    // Jobs are inserted before the commit: if we die in between, the chunks still point at no live job.
    await boss.insert(
      jobs.map((j) => ({
        id: j.id,
        name: SWEEP_QUEUE,
        data: { sweepId: j.sweepId, chunkIndex: j.chunkIndex } satisfies ChunkJob,
        retryLimit: JOB_RETRY_LIMIT,
        expireInSeconds: JOB_EXPIRE_SECONDS,
      })),
    );
    await qr.commitTransaction();
    return jobs.length;
  } catch (err) {
    if (qr.isTransactionActive) await qr.rollbackTransaction();
    throw err;
  } finally {
    await qr.release();
  }
}
