/**
 * A database of a test file's own on the shared test cluster, for migration tests that revert and re-apply
 * migrations (which must not disturb the other files' database). Created before the file's tests, dropped after.
 */
import pg from 'pg';
import { afterAll, beforeAll, inject } from 'vitest';
import { createDataSource } from '../../server/data-source.ts';

export function useOwnDatabase(name: string): { dataSource: () => ReturnType<typeof createDataSource> } {
  const admin = () => new pg.Client({ connectionString: inject('adminUrl') });
  beforeAll(async () => {
    const c = admin();
    await c.connect();
    await c.query(`DROP DATABASE IF EXISTS ${name}`);
    await c.query(`CREATE DATABASE ${name} OWNER lobewise`);
    await c.end();
  });
  afterAll(async () => {
    const c = admin();
    await c.connect();
    await c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    await c.end();
  });
  return { dataSource: () => createDataSource(inject('databaseUrl').replace(/\/[^/]+$/, `/${name}`)) };
}
