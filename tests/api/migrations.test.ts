import { describe, expect, it } from 'vitest';
import type { createDataSource } from '../../server/data-source.ts';
import { useOwnDatabase } from '../helpers/own-database.ts';
import { migrations } from '../../server/migrations/index.ts';

// A database of its own, so reverting every migration cannot disturb other test files.
const DB = 'lobewise_migration_check';
const { dataSource } = useOwnDatabase(DB);

async function tables(db: ReturnType<typeof createDataSource>): Promise<string[]> {
  const rows: { tablename: string }[] = await db.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations' ORDER BY 1`,
  );
  return rows.map((r) => r.tablename);
}

describe('migrations', () => {
  it('run up, all the way down, and up again cleanly', async () => {
    const db = dataSource();
    await db.initialize();
    try {
      const ran = await db.runMigrations({ transaction: 'each' });
      expect(ran).toHaveLength(migrations.length);
      const after = await tables(db);
      expect(after).toEqual(expect.arrayContaining(['teams', 'users']));
      for (let i = 0; i < migrations.length; i++) await db.undoLastMigration({ transaction: 'each' });
      expect(await tables(db)).toEqual([]);
      await db.runMigrations({ transaction: 'each' });
      expect(await tables(db)).toEqual(after);
    } finally {
      await db.destroy();
    }
  });
});
