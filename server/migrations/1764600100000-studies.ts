import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Studies and their explicit shares. */
export class Studies1764600100000 implements MigrationInterface {
  name = 'Studies1764600100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE studies (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES teams(id) ON DELETE CASCADE,
      owner_id uuid NOT NULL REFERENCES users(id),
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
      description text NOT NULL DEFAULT '',
      visibility text NOT NULL DEFAULT 'team' CHECK (visibility IN ('private', 'team')),
      archived_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX studies_team_id_idx ON studies (team_id)`);
    await q.query(`CREATE TABLE study_shares (
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      access text NOT NULL CHECK (access IN ('editor', 'viewer')),
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (study_id, user_id)
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE study_shares`);
    await q.query(`DROP TABLE studies`);
  }
}
