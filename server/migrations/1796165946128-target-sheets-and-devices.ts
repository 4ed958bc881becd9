import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Several target sheets per study, and devices (modules placed on a device outline).
 * target_sheets gains its own id and a position; the study's existing sheet keeps its data and becomes the
 * study's first sheet. Candidates, sweeps and devices name the sheet that judges them (target_sheet_id); existing
 * candidates and sweeps are pointed at their study's existing sheet so they are judged as before. Removing a sheet
 * clears the reference (the study's first sheet then judges them).
 */
export class TargetSheetsAndDevices1796165946128 implements MigrationInterface {
  name = 'TargetSheetsAndDevices1796165946128';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE target_sheets ADD COLUMN id uuid NOT NULL DEFAULT gen_random_uuid()`);
    await q.query(`ALTER TABLE target_sheets ADD COLUMN position integer NOT NULL DEFAULT 0`);
    await q.query(`ALTER TABLE target_sheets ADD COLUMN created_at timestamptz NOT NULL DEFAULT now()`);
    await q.query(`ALTER TABLE target_sheets DROP CONSTRAINT target_sheets_pkey`);
    await q.query(`ALTER TABLE target_sheets ADD PRIMARY KEY (id)`);
    await q.query(`CREATE INDEX target_sheets_study_id_idx ON target_sheets (study_id, position)`);
    for (const table of ['candidates', 'sweeps']) {
      await q.query(`ALTER TABLE ${table} ADD COLUMN target_sheet_id uuid REFERENCES target_sheets(id) ON DELETE SET NULL`);
      await q.query(`UPDATE ${table} t SET target_sheet_id = ts.id FROM target_sheets ts WHERE ts.study_id = t.study_id`);
    }
    await q.query(`CREATE TABLE devices (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      study_id uuid NOT NULL REFERENCES studies(id) ON DELETE CASCADE,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
      target_sheet_id uuid REFERENCES target_sheets(id) ON DELETE SET NULL,
      layout jsonb NOT NULL,
      notes text NOT NULL DEFAULT '',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      position integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query(`CREATE INDEX devices_study_id_idx ON devices (study_id, position)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE devices`);
    for (const table of ['candidates', 'sweeps']) await q.query(`ALTER TABLE ${table} DROP COLUMN target_sheet_id`);
    // One sheet per study again: keep each study's first.
    await q.query(`DELETE FROM target_sheets t USING target_sheets f
      WHERE f.study_id = t.study_id AND (f.position, f.created_at, f.id) < (t.position, t.created_at, t.id)`);
    await q.query(`DROP INDEX target_sheets_study_id_idx`);
    await q.query(`ALTER TABLE target_sheets DROP CONSTRAINT target_sheets_pkey`);
    await q.query(`ALTER TABLE target_sheets ADD PRIMARY KEY (study_id)`);
    await q.query(`ALTER TABLE target_sheets DROP COLUMN created_at`);
    await q.query(`ALTER TABLE target_sheets DROP COLUMN position`);
    await q.query(`ALTER TABLE target_sheets DROP COLUMN id`);
  }
}
