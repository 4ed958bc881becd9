import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Comments, review requests and decisions. A signed decision is immutable in the database itself:
 * a row trigger refuses UPDATE and DELETE once signed_at is set (TRUNCATE is not a row operation and stays
 * available to maintenance and the test helper). A change of mind is a new row whose supersedes_id links back.
 */
export class Review1764600600000 implements MigrationInterface {
  name = 'Review1764600600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE comments (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      author_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      body text NOT NULL CHECK (length(body) BETWEEN 1 AND 10000),
      target_kind text NOT NULL DEFAULT 'study' CHECK (target_kind IN ('study', 'design', 'chart')),
      target_ref text,
      view_state jsonb,
      mentions uuid[] NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX comments_study_id_idx ON comments (study_id, created_at)`);

    await q.query(`CREATE TABLE review_requests (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      requested_by_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      reviewer_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      state text NOT NULL DEFAULT 'asked' CHECK (state IN ('asked', 'approved', 'changes_requested')),
      message text NOT NULL DEFAULT '',
      note text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      answered_at timestamptz,
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX review_requests_study_id_idx ON review_requests (study_id, created_at)`);

    // source is a sweep design id "<sweep id>:<design index>"; no foreign key: the sweep may be deleted later,
    // and the frozen copy in the row is what counts.
    await q.query(`CREATE TABLE decisions (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE RESTRICT,
      decided_by_id uuid NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      label text NOT NULL CHECK (length(label) BETWEEN 1 AND 300),
      design jsonb NOT NULL,
      metrics jsonb NOT NULL,
      engine_version text NOT NULL,
      source text CHECK (source IS NULL OR length(source) <= 100),
      rationale text NOT NULL CHECK (length(rationale) BETWEEN 1 AND 20000),
      alternatives jsonb NOT NULL DEFAULT '[]',
      signed_at timestamptz,
      supersedes_id uuid REFERENCES decisions(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX decisions_study_id_idx ON decisions (study_id, created_at)`);
    // The history is a chain: each decision is superseded at most once.
    await q.query(`CREATE UNIQUE INDEX decisions_supersedes_id_key ON decisions (supersedes_id) WHERE supersedes_id IS NOT NULL`);

    await q.query(`CREATE FUNCTION decisions_refuse_signed_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF OLD.signed_at IS NOT NULL THEN
          RAISE EXCEPTION 'decision % is signed and cannot be changed or deleted; record a new decision that supersedes it', OLD.id
            USING ERRCODE = 'P0001';
        END IF;
        IF TG_OP = 'DELETE' THEN
          RETURN OLD;
        END IF;
        RETURN NEW;
      END
    $$`);
    await q.query(`CREATE TRIGGER decisions_signed_immutable
      BEFORE UPDATE OR DELETE ON decisions
      FOR EACH ROW EXECUTE FUNCTION decisions_refuse_signed_change()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE decisions`);
    await q.query(`DROP FUNCTION decisions_refuse_signed_change()`);
    await q.query(`DROP TABLE review_requests`);
    await q.query(`DROP TABLE comments`);
  }
}
