import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Element patterns uploaded per study (raw file kept beside the parsed grid). */
export class ElementPatterns1796167137246 implements MigrationInterface {
  name = 'ElementPatterns1796167137246';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE element_patterns (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
      original_filename text NOT NULL,
      raw bytea NOT NULL,
      pattern jsonb NOT NULL,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX element_patterns_study_id_idx ON element_patterns (study_id, created_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE element_patterns`);
  }
}
