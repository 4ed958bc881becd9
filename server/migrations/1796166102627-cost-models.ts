import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Cost columns of sweep_designs that the trade table sorts and filters on (indexes both ways, as 1764600700000). */
const COST_SORT_COLUMNS = ['conducted_power_dbm', 'beamformer_chips', 'cost_usd', 'dc_power_w', 'heat_w_per_cm2'];

/**
 * A cost-and-power model per study (prices and overheads as JSON, with a version that counts saves), and the cost
 * figures of each sweep design under it. sweeps.cost_model_version records which version the figures were made
 * with: saving a model recomputes them, so it is always the study's current version once a save has finished.
 */
export class CostModels1796166102627 implements MigrationInterface {
  name = 'CostModels1796166102627';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE study_cost_models (
      study_id uuid PRIMARY KEY REFERENCES studies(id) ON DELETE CASCADE,
      model jsonb NOT NULL,
      version integer NOT NULL DEFAULT 1 CHECK (version >= 1),
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`ALTER TABLE sweeps ADD COLUMN cost_model_version integer`);
    await q.query(`ALTER TABLE sweep_designs
      ADD COLUMN conducted_power_dbm double precision,
      ADD COLUMN beamformer_chips integer,
      ADD COLUMN cost_usd double precision,
      ADD COLUMN dc_power_w double precision,
      ADD COLUMN heat_w_per_cm2 double precision`);
    for (const c of COST_SORT_COLUMNS) {
      await q.query(`CREATE INDEX sweep_designs_${c}_idx ON sweep_designs (sweep_id, ${c}, design_index)`);
      await q.query(`CREATE INDEX sweep_designs_${c}_desc_idx ON sweep_designs (sweep_id, ${c} DESC NULLS LAST, design_index)`);
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const c of COST_SORT_COLUMNS) {
      await q.query(`DROP INDEX sweep_designs_${c}_desc_idx`);
      await q.query(`DROP INDEX sweep_designs_${c}_idx`);
    }
    await q.query(`ALTER TABLE sweep_designs DROP COLUMN heat_w_per_cm2, DROP COLUMN dc_power_w, DROP COLUMN cost_usd,
      DROP COLUMN beamformer_chips, DROP COLUMN conducted_power_dbm`);
    await q.query(`ALTER TABLE sweeps DROP COLUMN cost_model_version`);
    await q.query(`DROP TABLE study_cost_models`);
  }
}
