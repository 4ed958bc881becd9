import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Teams and their users. */
export class Init1764600000000 implements MigrationInterface {
  name = 'Init1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE teams (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE TABLE users (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email text NOT NULL,
      name text NOT NULL,
      password_hash text,
      role text NOT NULL CHECK (role IN ('admin', 'engineer', 'reviewer')),
      team_id uuid NOT NULL REFERENCES teams(id) ON DELETE CASCADE,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE UNIQUE INDEX users_email_key ON users (email)`);
    await q.query(`CREATE INDEX users_team_id_idx ON users (team_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE users`);
    await q.query(`DROP TABLE teams`);
  }
}
