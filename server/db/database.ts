/** Brings up the database for a process: our own cluster unless DATABASE_URL points elsewhere, then migrations. */
import { chmodSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { Config } from '../config.ts';
import { createDataSource } from '../data-source.ts';
import { startCluster, type Cluster } from './cluster.ts';

export interface Database {
  db: DataSource;
  url: string;
  /** Present when this process started PostgreSQL itself. */
  cluster?: Cluster;
  close(): Promise<void>;
}

export async function openDatabase(
  config: Config,
  log: (m: string) => void,
  options: { migrate?: boolean; poolSize?: number } = {},
): Promise<Database> {
  let cluster: Cluster | undefined;
  let url = config.DATABASE_URL;
  if (!url) {
    // DATA_DIR is ours: let the unprivileged server user pass through it when we run as root.
    mkdirSync(config.DATA_DIR, { recursive: true });
    if (process.getuid?.() === 0) chmodSync(config.DATA_DIR, 0o711);
    cluster = await startCluster({
      dataDir: path.join(config.DATA_DIR, 'postgres'),
      port: config.PGPORT_LOBEWISE,
      database: 'lobewise',
      durable: true,
      log,
    });
    url = cluster.url;
  }
  const db = createDataSource(url, { poolSize: options.poolSize });
  try {
    await db.initialize();
    if (options.migrate !== false) await db.runMigrations({ transaction: 'each' });
  } catch (err) {
    await cluster?.stop();
    throw err;
  }
  return {
    db,
    url,
    cluster,
    close: async () => {
      if (db.isInitialized) await db.destroy();
      await cluster?.stop();
    },
  };
}
