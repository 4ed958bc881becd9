/** A migrated DataSource on the test cluster, and a truncate helper so every case starts clean. */
import { inject } from 'vitest';
import type { DataSource } from 'typeorm';
import { loadConfig } from '../../server/config.ts';
import type { AppContext } from '../../server/context.ts';
import { createDataSource } from '../../server/data-source.ts';
import { createLogger } from '../../server/logger.ts';

export async function openTestDb(): Promise<DataSource> {
  const db = createDataSource(inject('databaseUrl'), { poolSize: 5 });
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  return db;
}

/** Empties every application table (keeps the migrations record). */
export async function truncateAll(db: DataSource): Promise<void> {
  const rows: { tablename: string }[] = await db.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations'`,
  );
  if (rows.length === 0) return;
  await db.query(`TRUNCATE ${rows.map((r) => `"${r.tablename}"`).join(', ')} RESTART IDENTITY CASCADE`);
}

export function testConfig(overrides: Record<string, string> = {}) {
  return loadConfig({ NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), SESSION_SECRET: 'test-secret-0123456789', ...overrides });
}

export async function openTestContext(overrides: Record<string, string> = {}): Promise<AppContext> {
  const config = testConfig(overrides);
  return { config, db: await openTestDb(), log: createLogger(config) };
}
