import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sessions, audit trail, invitations, password resets, API tokens and the local outbox. */
export class Accounts1764600200000 implements MigrationInterface {
  name = 'Accounts1764600200000';

  async up(q: QueryRunner): Promise<void> {
    // Layout expected by connect-pg-simple (its table.sql), under our own table name.
    await q.query(`CREATE TABLE sessions (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    )`);
    await q.query(`CREATE INDEX sessions_expire_idx ON sessions (expire)`);
    await q.query(`CREATE TABLE audit_events (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid,
      actor_id uuid,
      actor_email text,
      action text NOT NULL,
      target_type text,
      target_id text,
      details jsonb NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX audit_events_team_id_idx ON audit_events (team_id, created_at)`);
    await q.query(`CREATE TABLE invitations (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES teams(id) ON DELETE CASCADE,
      email text NOT NULL,
      role text NOT NULL CHECK (role IN ('admin', 'engineer', 'reviewer')),
      token_hash text NOT NULL UNIQUE,
      invited_by_id uuid REFERENCES users(id) ON DELETE SET NULL,
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX invitations_team_id_idx ON invitations (team_id)`);
    await q.query(`CREATE TABLE password_resets (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE TABLE api_tokens (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      name text NOT NULL,
      token_hash text NOT NULL UNIQUE,
      prefix text NOT NULL,
      last_used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX api_tokens_user_id_idx ON api_tokens (user_id)`);
    await q.query(`CREATE TABLE mail_messages (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid,
      message_id text,
      from_address text NOT NULL,
      to_addresses text[] NOT NULL,
      subject text NOT NULL,
      text_body text NOT NULL,
      html_body text,
      raw text NOT NULL,
      received_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX mail_messages_team_id_idx ON mail_messages (team_id, received_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE mail_messages`);
    await q.query(`DROP TABLE api_tokens`);
    await q.query(`DROP TABLE password_resets`);
    await q.query(`DROP TABLE invitations`);
    await q.query(`DROP TABLE audit_events`);
    await q.query(`DROP TABLE sessions`);
  }
}
