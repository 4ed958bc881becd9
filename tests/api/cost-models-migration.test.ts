/** The cost-model migration: up adds the table, the sweep version and the indexed design columns; down removes only them. */
import { describe, expect, it } from 'vitest';
import { useOwnDatabase } from '../helpers/own-database.ts';

const DB = 'lobewise_cost_migration_check';
const MINE = 'CostModels1796166102627';
const COST_COLUMNS = ['beamformer_chips', 'conducted_power_dbm', 'cost_usd', 'dc_power_w', 'heat_w_per_cm2'];
const { dataSource } = useOwnDatabase(DB);

describe('cost models (migration)', () => {
  it('goes down to the schema before it, keeping stored designs, and up again with empty cost columns', async () => {
    const db = dataSource();
    await db.initialize();
    const columns = async () =>
      ((await db.query(
        `SELECT column_name FROM information_schema.columns WHERE table_name = 'sweep_designs' AND column_name = ANY($1) ORDER BY 1`,
        [COST_COLUMNS],
      )) as { column_name: string }[]).map((r) => r.column_name);
    const costTable = async () => ((await db.query(`SELECT to_regclass('study_cost_models') AS t`)) as { t: string | null }[])[0]!.t;
    const indexes = async () =>
      ((await db.query(`SELECT indexname FROM pg_indexes WHERE tablename = 'sweep_designs' AND indexname LIKE ANY($1) ORDER BY 1`, [
        COST_COLUMNS.map((c) => `sweep_designs_${c}_%`),
      ])) as { indexname: string }[]).map((r) => r.indexname);
    try {
      await db.runMigrations({ transaction: 'each' });
      expect(await columns()).toEqual(COST_COLUMNS);
      // Ascending and descending (NULLS LAST) index per column, as the other sort columns have.
      expect(await indexes()).toHaveLength(2 * COST_COLUMNS.length);
      for (;;) {
        const [last] = (await db.query(`SELECT name FROM migrations ORDER BY id DESC LIMIT 1`)) as { name: string }[];
        await db.undoLastMigration({ transaction: 'each' });
        if (last!.name === MINE) break;
      }
      expect(await columns()).toEqual([]);
      expect(await costTable()).toBeNull();
      expect(await indexes()).toEqual([]);

      const [team] = await db.query(`INSERT INTO teams (name) VALUES ('T') RETURNING id`);
      const [user] = await db.query(`INSERT INTO users (email, name, role, team_id) VALUES ('e@x.test', 'E', 'engineer', $1) RETURNING id`, [team.id]);
      const [study] = await db.query(`INSERT INTO studies (team_id, owner_id, name) VALUES ($1, $2, 'S') RETURNING id`, [team.id, user.id]);
      const [sweep] = await db.query(
        `INSERT INTO sweeps (study_id, name, grid, points_total, designs_total, angles_per_design, chunks_total, engine_version)
         VALUES ($1, 'W', '{}', 1, 1, 1, 1, 'x') RETURNING id`,
        [study.id],
      );
      await db.query(`INSERT INTO sweep_designs (sweep_id, design_index, nx, channels, design, angles, points_failed) VALUES ($1, 0, 4, 4, '{}', 1, 0)`, [sweep.id]);

      await db.runMigrations({ transaction: 'each' });
      expect(await columns()).toEqual(COST_COLUMNS);
      expect(await costTable()).toBe('study_cost_models');
      const [d] = await db.query(`SELECT nx, cost_usd, dc_power_w FROM sweep_designs WHERE sweep_id = $1`, [sweep.id]);
      expect(d).toEqual({ nx: 4, cost_usd: null, dc_power_w: null });
      const [s] = await db.query(`SELECT cost_model_version FROM sweeps WHERE id = $1`, [sweep.id]);
      expect(s.cost_model_version).toBeNull();
      // A model's version starts at 1 and cannot be 0.
      await expect(db.query(`INSERT INTO study_cost_models (study_id, model, version) VALUES ($1, '{}', 0)`, [study.id])).rejects.toThrow(/check/i);
    } finally {
      await db.destroy();
    }
  });
});
