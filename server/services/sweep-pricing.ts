/**
 * Keeps the cost figures of stored sweep designs on the study's current cost model.
 * - The sweep writer prices new design rows with the model it reads after locking the sweep row.
 * - A model save re-prices what is stored. A study with few stored designs is re-priced inside the save's
 *   transaction (every sweep row locked, so a chunk written meanwhile is priced with the new model or re-priced).
 *   A larger one is re-priced after the save, in batches of one short transaction each under the sweep row's
 *   lock, so saving never holds the sweeps for minutes; until a sweep is done, sweeps.cost_model_version keeps the
 *   older version and the designs endpoint says its figures are not yet on the current model.
 * Re-pricing is idempotent, so a batch done twice (two processes, a restart) changes nothing.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { CostModelSchema, type CostModel, type SweepCostBasis } from '../../shared/cost/cost-model.ts';
import { designCostColumns } from '../../shared/sweep/design-cost.ts';
import type { Logger } from 'pino';
import { forgetReadAccess } from './read-access-cache.ts';

export interface CurrentCostModel {
  model: CostModel;
  version: number;
}

/** Stored designs a save re-prices inside its own transaction; above this the work moves after the save. */
export const INLINE_REPRICE_DESIGNS = 5_000;

/** The study's model, read afresh (call it after taking the sweep row's lock); null when none is saved. */
export async function currentCostModel(m: EntityManager, studyId: string): Promise<CurrentCostModel | null> {
  const [row] = (await m.query(`SELECT model, version FROM study_cost_models WHERE study_id = $1`, [studyId])) as {
    model: unknown;
    version: number;
  }[];
  if (!row) return null;
  // A stored model that no longer parses (a hand edit of the database) prices nothing rather than wrongly.
  const parsed = CostModelSchema.safeParse(row.model);
  return parsed.success ? { model: parsed.data, version: row.version } : null;
}

/** Rows re-priced per UPDATE (and per transaction when re-pricing after a save). */
const BATCH = 2000;

interface StoredInputs {
  design_index: number;
  nx: number | null;
  ny: number | null;
  channels: number | null;
  aperture_x_mm: number | null;
  aperture_y_mm: number | null;
  conducted_power_dbm: number | null;
}

/**
 * Re-prices the designs after `after` (design index), one batch; answers the last index done, or null at the end.
 * A device sweep's rows are variants of a whole device, not module designs the model prices: none are re-priced
 * (their sweep still moves to the current model version, so it never reads as behind).
 */
async function repriceBatch(m: EntityManager, sweepId: string, after: number, model: CostModel | null): Promise<number | null> {
  const rows = (await m.query(
    `SELECT design_index, nx, ny, channels, aperture_x_mm, aperture_y_mm, conducted_power_dbm FROM sweep_designs
     WHERE sweep_id = $1 AND design_index > $2 AND NOT EXISTS (SELECT 1 FROM sweeps WHERE id = $1 AND device IS NOT NULL)
     ORDER BY design_index LIMIT ${BATCH}`,
    [sweepId, after],
  )) as StoredInputs[];
  if (rows.length === 0) return null;
  const priced = rows.map((r) => ({
    design_index: r.design_index,
    ...designCostColumns(
      { nx: r.nx, ny: r.ny, channels: r.channels, apertureXMm: r.aperture_x_mm, apertureYMm: r.aperture_y_mm, conductedPowerDbm: r.conducted_power_dbm },
      model,
    ),
  }));
  await m.query(
    `UPDATE sweep_designs d SET beamformer_chips = v."beamformerChips", cost_usd = v."costUsd", dc_power_w = v."dcPowerW",
       heat_w_per_cm2 = v."heatWPerCm2"
     FROM jsonb_to_recordset($2::jsonb) AS v(design_index integer, "beamformerChips" integer, "costUsd" float8, "dcPowerW" float8, "heatWPerCm2" float8)
     WHERE d.sweep_id = $1 AND d.design_index = v.design_index
       -- An unchanged row is not rewritten: every sort index of the table would get a new entry for it.
       AND (d.beamformer_chips, d.cost_usd, d.dc_power_w, d.heat_w_per_cm2) IS DISTINCT FROM (v."beamformerChips", v."costUsd", v."dcPowerW", v."heatWPerCm2")`,
    [sweepId, JSON.stringify(priced)],
  );
  return rows.length < BATCH ? null : rows[rows.length - 1]!.design_index;
}

/** Stored designs of the study's sweeps (what a re-pricing would touch). */
export async function storedDesigns(m: EntityManager, studyId: string): Promise<number> {
  const [r] = (await m.query(`SELECT count(*)::int AS n FROM sweep_designs d JOIN sweeps s ON s.id = d.sweep_id WHERE s.study_id = $1`, [studyId])) as {
    n: number;
  }[];
  return r?.n ?? 0;
}

/** Re-prices every sweep of the study under `current` inside the caller's transaction (the save's). */
export async function repriceStudySweeps(m: EntityManager, studyId: string, current: CurrentCostModel | null): Promise<number> {
  // Lock in id order so two saves of one study queue up instead of deadlocking.
  const sweeps = (await m.query(`SELECT id FROM sweeps WHERE study_id = $1 ORDER BY id FOR UPDATE`, [studyId])) as { id: string }[];
  for (const s of sweeps) {
    let after: number | null = -1;
    while (after !== null) after = await repriceBatch(m, s.id, after, current?.model ?? null);
    await m.query(`UPDATE sweeps SET cost_model_version = $2 WHERE id = $1`, [s.id, current?.version ?? null]);
  }
  return sweeps.length;
}

/** Studies being re-priced by this process, so a second request does not start the same work again. */
const running = new Map<string, Promise<void>>();

/**
 * Re-prices the study's sweeps that are not on its current model, batch by batch, each batch a transaction holding
 * the sweep row's lock. Stops when a newer save arrives (that save's own re-pricing takes over).
 */
async function repriceStale(db: DataSource, studyId: string): Promise<void> {
  const stale = (await db.query(
    `SELECT s.id, c.version FROM sweeps s JOIN study_cost_models c ON c.study_id = s.study_id
     WHERE s.study_id = $1 AND s.cost_model_version IS DISTINCT FROM c.version ORDER BY s.id`,
    [studyId],
  )) as { id: string; version: number }[];
  for (const s of stale) {
    let after: number | null = -1;
    while (after !== null) {
      const from: number = after;
      const next = await db.transaction(async (m) => {
        await m.query(`SELECT 1 FROM sweeps WHERE id = $1 FOR UPDATE`, [s.id]);
        const current = await currentCostModel(m, studyId);
        if (!current || current.version !== s.version) return 'superseded' as const;
        const done = await repriceBatch(m, s.id, from, current.model);
        if (done === null) await m.query(`UPDATE sweeps SET cost_model_version = $2 WHERE id = $1`, [s.id, current.version]);
        return done;
      });
      if (next === 'superseded') return;
      if (next === null) forgetReadAccess(db); // the sweep's state changed (its cost model version)
      after = next;
    }
  }
}

/**
 * Starts re-pricing the study's stale sweeps in the background; never throws. While this process is already at
 * it, a save (`queue`) runs again after it (the running pass stops at its next batch once superseded) and a
 * read just waits for it.
 */
export function scheduleReprice(db: DataSource, log: Logger, studyId: string, queue = false): Promise<void> {
  const busy = running.get(studyId);
  if (busy) return queue ? busy.then(() => scheduleReprice(db, log, studyId, true)) : busy;
  const task = repriceStale(db, studyId)
    .catch((err: unknown) => log.warn({ err, studyId }, 'sweep re-pricing stopped; it resumes when the designs are next read'))
    .finally(() => running.delete(studyId));
  running.set(studyId, task);
  return task;
}

/** The model a sweep's stored figures used, against the study's current one. */
export async function sweepCostBasis(m: EntityManager, sweepId: string): Promise<SweepCostBasis> {
  const [row] = (await m.query(
    `SELECT s.cost_model_version AS version, c.version AS "currentVersion", c.model->>'currency' AS currency
     FROM sweeps s LEFT JOIN study_cost_models c ON c.study_id = s.study_id WHERE s.id = $1`,
    [sweepId],
  )) as { version: number | null; currentVersion: number | null; currency: string | null }[];
  const version = row?.version ?? null;
  const currentVersion = row?.currentVersion ?? null;
  return { version, currentVersion, currency: row?.currency ?? null, current: version === currentVersion };
}
