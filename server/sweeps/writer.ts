/**
 * Writes one chunk's results in one transaction on the main thread: the points and design rows
 * (INSERT … ON CONFLICT DO NOTHING, so a chunk done twice writes nothing twice), the chunk's status and
 * the sweep's counters, which only count rows actually inserted. A device sweep's points are its variants.
 */
import type { DataSource } from 'typeorm';
import type { PointResult } from '../../shared/sweep/chunk.ts';
import { currentCostModel } from '../services/sweep-pricing.ts';
import { designRows, deviceDesignRows, pointRow } from './rows.ts';

/** Rows per INSERT: one JSON parameter each, expanded by PostgreSQL (no parameter-count limit). */
const BATCH_ROWS = 1000;

export type WriteOutcome = 'written' | 'skipped';

export async function writeChunk(
  db: DataSource,
  sweepId: string,
  chunkIndex: number,
  points: PointResult[],
  workerId: string,
  kind: 'grid' | 'device' = 'grid',
): Promise<WriteOutcome> {
  return db.transaction(async (m) => {
    // Lock the sweep row: a cancel and the counters serialise against it.
    const [sweep] = (await m.query(`SELECT status, study_id FROM sweeps WHERE id = $1 FOR UPDATE`, [sweepId])) as { status: string; study_id: string }[];
    if (!sweep || (sweep.status !== 'queued' && sweep.status !== 'running')) return 'skipped';
    // Read after the lock: a cost-model save re-prices under the same lock (services/sweep-pricing.ts).
    const cost = await currentCostModel(m, sweep.study_id);
    let inserted = 0;
    let failed = 0;
    for (let i = 0; i < points.length; i += BATCH_ROWS) {
      const rows = points.slice(i, i + BATCH_ROWS).map((p) => pointRow(sweepId, p));
      const res = (await m.query(
        `INSERT INTO sweep_points SELECT * FROM jsonb_populate_recordset(NULL::sweep_points, $1::jsonb)
         ON CONFLICT DO NOTHING RETURNING (error IS NOT NULL) AS failed`,
        [JSON.stringify(rows)],
      )) as { failed: boolean }[];
      inserted += res.length;
      failed += res.filter((r) => r.failed).length;
    }
    // A device sweep's design row is its variant's coverage; it is priced by no module model (a device is several).
    const designs = kind === 'device' ? deviceDesignRows(sweepId, points) : designRows(sweepId, points, cost?.model ?? null);
    for (let i = 0; i < designs.length; i += BATCH_ROWS) {
      await m.query(
        `INSERT INTO sweep_designs SELECT * FROM jsonb_populate_recordset(NULL::sweep_designs, $1::jsonb) ON CONFLICT DO NOTHING`,
        [JSON.stringify(designs.slice(i, i + BATCH_ROWS))],
      );
    }
    await m.query(
      `UPDATE sweep_chunks SET status = 'done', worker_id = $3, done_at = now(), claimed_by = NULL
       WHERE sweep_id = $1 AND chunk_index = $2 AND status <> 'done'`,
      [sweepId, chunkIndex, workerId],
    );
    await m.query(
      `UPDATE sweeps SET points_done = points_done + $2, points_failed = points_failed + $3,
         status = CASE WHEN points_done + $2 >= points_total THEN 'done' ELSE 'running' END,
         started_at = COALESCE(started_at, now()),
         finished_at = CASE WHEN points_done + $2 >= points_total THEN now() ELSE finished_at END,
         updated_at = now(), cost_model_version = $4
       WHERE id = $1`,
      [sweepId, inserted, failed, cost?.version ?? null],
    );
    return 'written';
  });
}
