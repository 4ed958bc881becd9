/**
 * Keeps the cost figures of stored sweep designs on the study's current cost model. The sweep writer prices new
 * design rows with the model it reads after locking the sweep row; a model save locks every sweep row of the study
 * and re-prices what is stored. Both hold the sweep row's lock, so a chunk written during a save is either priced
 * with the new model or re-priced by the save: no row keeps an older model once the save commits.
 */
import type { EntityManager } from 'typeorm';
import { CostModelSchema, type CostModel, type SweepCostBasis } from '../../shared/cost/cost-model.ts';
import { designCostColumns } from '../../shared/sweep/design-cost.ts';

export interface CurrentCostModel {
  model: CostModel;
  version: number;
}

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

/** Rows re-priced per UPDATE. */
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

/** Re-prices one sweep's stored designs (keyset batches, so memory stays flat) and records the model version. */
async function repriceSweep(m: EntityManager, sweepId: string, current: CurrentCostModel | null): Promise<void> {
  let after = -1;
  for (;;) {
    const rows = (await m.query(
      `SELECT design_index, nx, ny, channels, aperture_x_mm, aperture_y_mm, conducted_power_dbm FROM sweep_designs
       WHERE sweep_id = $1 AND design_index > $2 ORDER BY design_index LIMIT ${BATCH}`,
      [sweepId, after],
    )) as StoredInputs[];
    if (rows.length === 0) break;
    const priced = rows.map((r) => ({
      design_index: r.design_index,
      ...designCostColumns(
        { nx: r.nx, ny: r.ny, channels: r.channels, apertureXMm: r.aperture_x_mm, apertureYMm: r.aperture_y_mm, conductedPowerDbm: r.conducted_power_dbm },
        current?.model ?? null,
      ),
    }));
    await m.query(
      `UPDATE sweep_designs d SET beamformer_chips = v."beamformerChips", cost_usd = v."costUsd", dc_power_w = v."dcPowerW",
         heat_w_per_cm2 = v."heatWPerCm2"
       FROM jsonb_to_recordset($2::jsonb) AS v(design_index integer, "beamformerChips" integer, "costUsd" float8, "dcPowerW" float8, "heatWPerCm2" float8)
       WHERE d.sweep_id = $1 AND d.design_index = v.design_index`,
      [sweepId, JSON.stringify(priced)],
    );
    after = rows[rows.length - 1]!.design_index;
    if (rows.length < BATCH) break;
  }
  await m.query(`UPDATE sweeps SET cost_model_version = $2 WHERE id = $1`, [sweepId, current?.version ?? null]);
}

/** Re-prices every sweep of the study under `current`; run inside the transaction that saved the model. */
export async function repriceStudySweeps(m: EntityManager, studyId: string, current: CurrentCostModel | null): Promise<number> {
  // Lock in id order so two saves of one study queue up instead of deadlocking.
  const sweeps = (await m.query(`SELECT id FROM sweeps WHERE study_id = $1 ORDER BY id FOR UPDATE`, [studyId])) as { id: string }[];
  for (const s of sweeps) await repriceSweep(m, s.id, current);
  return sweeps.length;
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
