import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Summary columns of sweep_designs that the trade table sorts and filters on (one index each, per sweep). */
const DESIGN_SORT_COLUMNS = [
  'frequency_ghz', 'nx', 'ny', 'dx_mm', 'dy_mm', 'phase_bits', 'channel_power_dbm',
  'scan_range_deg', 'scan_loss_edge_db', 'scan_loss_max_db', 'hpbw_az_max_deg', 'hpbw_az_min_deg', 'hpbw_el_max_deg',
  'hpbw_el_min_deg', 'worst_sll_db', 'directivity_max_dbi', 'grating_lobe_onset_az_deg', 'grating_lobe_onset_el_deg',
  'peak_eirp_dbm', 'min_eirp_dbm', 'edge_eirp_dbm', 'aperture_x_mm', 'aperture_y_mm', 'channels', 'max_pointing_error_deg',
];
/** Point metrics most sorted on in the expanded rows and charts; the rest sort fast enough within one sweep. */
const POINT_SORT_COLUMNS = ['directivity_dbi', 'scan_loss_db', 'peak_sll_db', 'hpbw_az_deg', 'hpbw_el_deg', 'eirp_dbm', 'pointing_error_deg'];

/**
 * Sweeps, their chunks (one pg-boss job each), the worker processes taking part, every point's metrics as
 * typed columns, and one summary row per design for the trade table.
 */
export class Sweeps1764600300000 implements MigrationInterface {
  name = 'Sweeps1764600300000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE sweeps (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
      grid jsonb NOT NULL,
      constraints jsonb NOT NULL DEFAULT '{}',
      status text NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'running', 'done', 'failed', 'cancelled')),
      points_total integer NOT NULL,
      points_done integer NOT NULL DEFAULT 0,
      points_failed integer NOT NULL DEFAULT 0,
      designs_total integer NOT NULL,
      angles_per_design integer NOT NULL,
      chunks_total integer NOT NULL,
      engine_version text NOT NULL,
      error text,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      started_at timestamptz,
      finished_at timestamptz,
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX sweeps_study_id_idx ON sweeps (study_id, created_at DESC)`);
    await q.query(`CREATE INDEX sweeps_active_idx ON sweeps (status) WHERE status IN ('queued', 'running')`);

    await q.query(`CREATE TABLE sweep_workers (
      id text PRIMARY KEY,
      lock_key bigserial UNIQUE,
      host text NOT NULL,
      pid integer NOT NULL,
      threads integer NOT NULL,
      embedded boolean NOT NULL,
      started_at timestamptz NOT NULL DEFAULT now()
    )`);

    await q.query(`CREATE TABLE sweep_chunks (
      sweep_id uuid NOT NULL REFERENCES sweeps(id) ON DELETE CASCADE,
      chunk_index integer NOT NULL,
      point_start integer NOT NULL,
      point_end integer NOT NULL,
      status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'done', 'failed')),
      job_id uuid,
      claimed_by text,
      attempts integer NOT NULL DEFAULT 0,
      worker_id text,
      done_at timestamptz,
      PRIMARY KEY (sweep_id, chunk_index)
    )`);
    await q.query(`CREATE INDEX sweep_chunks_pending_idx ON sweep_chunks (sweep_id) WHERE status = 'pending'`);

    await q.query(`CREATE TABLE sweep_points (
      sweep_id uuid NOT NULL REFERENCES sweeps(id) ON DELETE CASCADE,
      point_index integer NOT NULL,
      design_index integer NOT NULL,
      angle_index integer NOT NULL,
      frequency_ghz double precision,
      nx integer,
      ny integer,
      dx_mm double precision,
      dy_mm double precision,
      taper_x text,
      taper_y text,
      phase_bits integer,
      grouping text,
      element text,
      channel_power_dbm double precision,
      steer_az_deg double precision,
      steer_el_deg double precision,
      design jsonb NOT NULL,
      peak_az_deg double precision,
      peak_el_deg double precision,
      pointing_error_deg double precision,
      hpbw_az_deg double precision,
      hpbw_el_deg double precision,
      hpbw_az_clipped boolean,
      hpbw_el_clipped boolean,
      sll_az_db double precision,
      sll_el_db double precision,
      peak_sll_db double precision,
      directivity_dbi double precision,
      scan_loss_db double precision,
      taper_efficiency_db double precision,
      grating_lobe_onset_az_deg double precision,
      grating_lobe_onset_el_deg double precision,
      grating_lobe_visible boolean,
      channels integer,
      aperture_x_mm double precision,
      aperture_y_mm double precision,
      eirp_dbm double precision,
      metrics jsonb,
      error text,
      PRIMARY KEY (sweep_id, point_index)
    )`);
    await q.query(`CREATE INDEX sweep_points_design_idx ON sweep_points (sweep_id, design_index, angle_index)`);
    for (const c of POINT_SORT_COLUMNS) await q.query(`CREATE INDEX sweep_points_${c}_idx ON sweep_points (sweep_id, ${c})`);

    await q.query(`CREATE TABLE sweep_designs (
      sweep_id uuid NOT NULL REFERENCES sweeps(id) ON DELETE CASCADE,
      design_index integer NOT NULL,
      frequency_ghz double precision,
      nx integer,
      ny integer,
      dx_mm double precision,
      dy_mm double precision,
      taper_x text,
      taper_y text,
      phase_bits integer,
      grouping text,
      element text,
      channel_power_dbm double precision,
      design jsonb NOT NULL,
      angles integer NOT NULL,
      points_failed integer NOT NULL,
      scan_range_deg double precision,
      scan_loss_edge_db double precision,
      scan_loss_max_db double precision,
      hpbw_az_max_deg double precision,
      hpbw_az_min_deg double precision,
      hpbw_el_max_deg double precision,
      hpbw_el_min_deg double precision,
      worst_sll_db double precision,
      directivity_max_dbi double precision,
      grating_lobe_onset_az_deg double precision,
      grating_lobe_onset_el_deg double precision,
      grating_lobe_visible_any boolean,
      peak_eirp_dbm double precision,
      min_eirp_dbm double precision,
      edge_eirp_dbm double precision,
      aperture_x_mm double precision,
      aperture_y_mm double precision,
      channels integer,
      max_pointing_error_deg double precision,
      PRIMARY KEY (sweep_id, design_index)
    )`);
    for (const c of DESIGN_SORT_COLUMNS) await q.query(`CREATE INDEX sweep_designs_${c}_idx ON sweep_designs (sweep_id, ${c})`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE sweep_designs`);
    await q.query(`DROP TABLE sweep_points`);
    await q.query(`DROP TABLE sweep_chunks`);
    await q.query(`DROP TABLE sweep_workers`);
    await q.query(`DROP TABLE sweeps`);
  }
}
