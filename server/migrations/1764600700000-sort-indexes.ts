import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Descending twins of the sort indexes. The results API orders by `col DESC NULLS LAST, <index column>`;
 * an ascending (sweep_id, col) index read backwards gives NULLS FIRST, so PostgreSQL sorted every row of the
 * sweep instead. With (sweep_id, col DESC NULLS LAST, key) the first page is read straight off the index.
 * The column lists are the ones that carry ascending indexes (1764600300000-sweeps.ts).
 */
const POINT_SORT_COLUMNS = ['directivity_dbi', 'scan_loss_db', 'peak_sll_db', 'hpbw_az_deg', 'hpbw_el_deg', 'eirp_dbm', 'pointing_error_deg'];
const DESIGN_SORT_COLUMNS = [
  'frequency_ghz', 'nx', 'ny', 'dx_mm', 'dy_mm', 'phase_bits', 'channel_power_dbm',
  'scan_range_deg', 'scan_loss_edge_db', 'scan_loss_max_db', 'hpbw_az_max_deg', 'hpbw_az_min_deg', 'hpbw_el_max_deg',
  'hpbw_el_min_deg', 'worst_sll_db', 'directivity_max_dbi', 'grating_lobe_onset_az_deg', 'grating_lobe_onset_el_deg',
  'peak_eirp_dbm', 'min_eirp_dbm', 'edge_eirp_dbm', 'aperture_x_mm', 'aperture_y_mm', 'channels', 'max_pointing_error_deg',
];

const TABLES = [
  { table: 'sweep_points', key: 'point_index', columns: POINT_SORT_COLUMNS },
  { table: 'sweep_designs', key: 'design_index', columns: DESIGN_SORT_COLUMNS },
];

export class SortIndexes1764600700000 implements MigrationInterface {
  name = 'SortIndexes1764600700000';

  async up(q: QueryRunner): Promise<void> {
    for (const { table, key, columns } of TABLES) {
      for (const c of columns) await q.query(`CREATE INDEX ${table}_${c}_desc_idx ON ${table} (sweep_id, ${c} DESC NULLS LAST, ${key})`);
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const { table, columns } of TABLES) {
      for (const c of columns) await q.query(`DROP INDEX ${table}_${c}_desc_idx`);
    }
  }
}
