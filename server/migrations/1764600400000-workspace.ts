import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Candidates of a study and its target sheet. */
export class Workspace1764600400000 implements MigrationInterface {
  name = 'Workspace1764600400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE candidates (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
      design jsonb NOT NULL,
      notes text NOT NULL DEFAULT '',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      position integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX candidates_study_id_idx ON candidates (study_id, position)`);
    await q.query(`CREATE TABLE target_sheets (
      study_id uuid PRIMARY KEY REFERENCES studies(id) ON DELETE CASCADE,
      preset text,
      sheet jsonb NOT NULL DEFAULT '{}',
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE target_sheets`);
    await q.query(`DROP TABLE candidates`);
  }
}
