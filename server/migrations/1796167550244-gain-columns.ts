import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Gain figures on sweep results: per point the element gain, the array gain at the peak and toward the steer, the
 * pointing loss, the conducted power and the EIRP toward the steer; per design their worst cases; the attenuator
 * settings as design parameters. Sortable columns get an ascending index and its descending twin, as the others.
 * Rows written before this keep null here (and their scan loss and EIRP by the earlier definitions).
 */
const POINT_COLUMNS: [string, string][] = [
  ['attenuator_step_db', 'double precision'], ['attenuator_bits', 'integer'],
  ['element_gain_dbi', 'double precision'], ['gain_dbi', 'double precision'], ['gain_at_steer_dbi', 'double precision'],
  ['pointing_loss_db', 'double precision'], ['conducted_power_dbm', 'double precision'], ['eirp_at_steer_dbm', 'double precision'],
];
const DESIGN_COLUMNS: [string, string][] = [
  ['attenuator_step_db', 'double precision'], ['attenuator_bits', 'integer'],
  ['gain_max_dbi', 'double precision'], ['gain_at_steer_min_dbi', 'double precision'],
  ['pointing_loss_max_db', 'double precision'], ['min_eirp_at_steer_dbm', 'double precision'],
];
const POINT_SORT = ['gain_dbi', 'gain_at_steer_dbi', 'pointing_loss_db', 'conducted_power_dbm', 'eirp_at_steer_dbm'];
const DESIGN_SORT = ['attenuator_step_db', 'attenuator_bits', 'gain_max_dbi', 'gain_at_steer_min_dbi', 'pointing_loss_max_db', 'min_eirp_at_steer_dbm'];
const TABLES = [
  { table: 'sweep_points', key: 'point_index', columns: POINT_COLUMNS, sort: POINT_SORT },
  { table: 'sweep_designs', key: 'design_index', columns: DESIGN_COLUMNS, sort: DESIGN_SORT },
];

export class GainColumns1796167550244 implements MigrationInterface {
  name = 'GainColumns1796167550244';

  async up(q: QueryRunner): Promise<void> {
    for (const { table, key, columns, sort } of TABLES) {
      await q.query(`ALTER TABLE ${table} ${columns.map(([c, t]) => `ADD COLUMN ${c} ${t}`).join(', ')}`);
      for (const c of sort) {
        await q.query(`CREATE INDEX ${table}_${c}_idx ON ${table} (sweep_id, ${c})`);
        await q.query(`CREATE INDEX ${table}_${c}_desc_idx ON ${table} (sweep_id, ${c} DESC NULLS LAST, ${key})`);
      }
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const { table, columns, sort } of TABLES) {
      for (const c of sort) {
        await q.query(`DROP INDEX ${table}_${c}_desc_idx`);
        await q.query(`DROP INDEX ${table}_${c}_idx`);
      }
      await q.query(`ALTER TABLE ${table} ${columns.map(([c]) => `DROP COLUMN ${c}`).join(', ')}`);
    }
  }
}
