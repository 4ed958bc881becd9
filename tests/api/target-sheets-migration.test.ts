/** The move to several sheets per study keeps an existing study's one sheet and points its candidates and sweeps at it. */
import { describe, expect, it } from 'vitest';
import { useOwnDatabase } from '../helpers/own-database.ts';

const DB = 'lobewise_sheets_migration_check';
const MINE = 'TargetSheetsAndDevices1796165946128';
const { dataSource } = useOwnDatabase(DB);

describe('several target sheets per study (migration)', () => {
  it('keeps the existing sheet as the first and makes candidates and sweeps name it; down keeps one sheet', async () => {
    const db = dataSource();
    await db.initialize();
    try {
      await db.runMigrations({ transaction: 'each' });
      // Back to just before this migration (undoing any that came after it too).
      for (;;) {
        const [last] = (await db.query(`SELECT name FROM migrations ORDER BY id DESC LIMIT 1`)) as { name: string }[];
        await db.undoLastMigration({ transaction: 'each' });
        if (last!.name === MINE) break;
      }
      const [team] = await db.query(`INSERT INTO teams (name) VALUES ('T') RETURNING id`);
      const [user] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('e@x.test', 'E', 'engineer', $1) RETURNING id`, [team.id]);
      const [study] = await db.query(`INSERT INTO studies (team_id, owner_id, name) VALUES ($1, $2, 'S') RETURNING id`, [team.id, user.id]);
      await db.query(`INSERT INTO target_sheets (study_id, preset, sheet) VALUES ($1, 'handset-28ghz', '{"name":"Old sheet","maxChannels":8}')`, [study.id]);
      const [cand] = await db.query(`INSERT INTO candidates (study_id, name, design) VALUES ($1, 'C', '{}') RETURNING id`, [study.id]);
      const [sweep] = await db.query(
        `INSERT INTO sweeps (study_id, name, grid, points_total, designs_total, angles_per_design, chunks_total, engine_version)
         VALUES ($1, 'W', '{}', 1, 1, 1, 1, 'x') RETURNING id`,
        [study.id],
      );

      await db.runMigrations({ transaction: 'each' });
      const sheets = await db.query(`SELECT id, position, preset, sheet FROM target_sheets WHERE study_id = $1`, [study.id]);
      expect(sheets).toHaveLength(1);
      expect(sheets[0]).toMatchObject({ position: 0, preset: 'handset-28ghz', sheet: { name: 'Old sheet', maxChannels: 8 } });
      const [c] = await db.query(`SELECT target_sheet_id FROM candidates WHERE id = $1`, [cand.id]);
      const [w] = await db.query(`SELECT target_sheet_id FROM sweeps WHERE id = $1`, [sweep.id]);
      expect(c.target_sheet_id).toBe(sheets[0].id);
      expect(w.target_sheet_id).toBe(sheets[0].id);

      // A second sheet, then down: one sheet per study again, the first kept.
      await db.query(`INSERT INTO target_sheets (study_id, sheet, position) VALUES ($1, '{"name":"Second"}', 1)`, [study.id]);
      for (;;) {
        const [last] = (await db.query(`SELECT name FROM migrations ORDER BY id DESC LIMIT 1`)) as { name: string }[];
        await db.undoLastMigration({ transaction: 'each' });
        if (last!.name === MINE) break;
      }
      const left = await db.query(`SELECT sheet->>'name' AS name FROM target_sheets WHERE study_id = $1`, [study.id]);
      expect(left).toEqual([{ name: 'Old sheet' }]);
    } finally {
      await db.destroy();
    }
  });
});
