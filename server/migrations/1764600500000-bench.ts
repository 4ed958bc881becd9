import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Bench: per-candidate calibration offsets and uploaded range measurements (raw file kept). */
export class Bench1764600500000 implements MigrationInterface {
  name = 'Bench1764600500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE calibrations (
      candidate_id uuid PRIMARY KEY REFERENCES candidates(id) ON DELETE CASCADE,
      offsets jsonb NOT NULL,
      source_filename text,
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE TABLE range_uploads (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      candidate_id uuid NOT NULL REFERENCES candidates(id) ON DELETE CASCADE,
      beam jsonb NOT NULL,
      set_name text NOT NULL CHECK (length(set_name) BETWEEN 1 AND 200),
      original_filename text NOT NULL,
      raw bytea NOT NULL,
      parsed jsonb NOT NULL,
      analysis jsonb NOT NULL,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX range_uploads_study_id_idx ON range_uploads (study_id, set_name, created_at)`);
    await q.query(`CREATE INDEX range_uploads_candidate_id_idx ON range_uploads (candidate_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE range_uploads`);
    await q.query(`DROP TABLE calibrations`);
  }
}
