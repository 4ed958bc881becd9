import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { createDataSource } from '../../server/data-source.ts';
import { migrations } from '../../server/migrations/index.ts';

// A database of its own, so reverting every migration cannot disturb other test files.
const DB = 'lobewise_migration_check';
const admin = () => new pg.Client({ connectionString: inject('adminUrl') });

beforeAll(async () => {
  const c = admin();
  await c.connect();
  await c.query(`DROP DATABASE IF EXISTS ${DB}`);
  await c.query(`CREATE DATABASE ${DB} OWNER lobewise`);
  await c.end();
});
afterAll(async () => {
  const c = admin();
  await c.connect();
  await c.query(`DROP DATABASE IF EXISTS ${DB} WITH (FORCE)`);
  await c.end();
});

async function tables(db: ReturnType<typeof createDataSource>): Promise<string[]> {
  const rows: { tablename: string }[] = await db.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations' ORDER BY 1`,
  );
  return rows.map((r) => r.tablename);
}

describe('migrations', () => {
  it('run up, all the way down, and up again cleanly', async () => {
    const url = inject('databaseUrl').replace(/\/[^/]+$/, `/${DB}`);
    const db = createDataSource(url);
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
