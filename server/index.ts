/**
 * Owns a server process: config, database (with our own PostgreSQL unless DATABASE_URL is set),
 * migrations, demo seed, listen, and an orderly shutdown that stops what it started.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from './app.ts';
import { destroyMonteCarloPool } from './bench/monte-carlo-pool.ts';
import { destroyCoveragePool } from './coverage/coverage-pool.ts';
import { loadConfig, type Config } from './config.ts';
import type { AppContext } from './context.ts';
import { openDatabase, type Database } from './db/database.ts';
import { createLogger } from './logger.ts';
import { openMail } from './mail/index.ts';
import { seedDemo } from './seed/index.ts';
import { startSweepRunner } from './sweeps/runner.ts';

export interface RunningServer {
  url: string;
  ctx: AppContext;
  database: Database;
  close(): Promise<void>;
}

export async function startServer(
  config: Config = loadConfig(),
  options: { clientDir?: string } = {},
): Promise<RunningServer> {
  const log = createLogger(config);
  const database = await openDatabase(config, (m) => log.info(m));
  // Without SMTP_URL this starts the local fake SMTP server, which keeps its mail in the database.
  const mail = await openMail(config, database.db, log).catch(async (err: unknown) => {
    await database.close();
    throw err;
  });
  const ctx: AppContext = { config, db: database.db, log, mailer: mail.mailer };
  try {
    ctx.sweeps = await startSweepRunner({ db: database.db, url: database.url, log, threads: config.SWEEP_THREADS, embedded: true, recoverEverySeconds: config.SWEEP_RECOVERY_SECONDS });
    if (config.SEED_DEMO) await seedDemo(ctx);
  } catch (err) {
    await ctx.sweeps?.stop();
    await mail.close();
    await database.close();
    throw err;
  }
  const app = createApp(ctx, { clientDir: options.clientDir });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.PORT, config.HOST, () => resolve(s));
    s.once('error', reject);
  });
  const { port } = server.address() as AddressInfo;
  const url = `http://${config.HOST}:${port}`;
  database.cluster?.announce(url);

  let closing: Promise<void> | undefined;
  const close = () =>
    (closing ??= (async () => {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        // Server-sent event streams never end on their own.
        server.closeAllConnections();
      });
      await ctx.sweeps?.stop();
      await destroyMonteCarloPool();
      await destroyCoveragePool();
      await mail.close();
      await database.close();
    })());
  return { url, ctx, database, close };
}
