/**
 * `npm run worker`: a stand-alone sweep worker with its own thread pool. It joins the pg-boss queue in the
 * database at DATABASE_URL (required: the workers of all machines share one database), evaluates chunks and
 * writes their results. Stops gracefully on SIGTERM/SIGINT: chunks in hand are finished and written.
 */
import { loadConfig } from './config.ts';
import { openDatabase } from './db/database.ts';
import { createLogger } from './logger.ts';
import { startSweepRunner } from './sweeps/runner.ts';

async function main(): Promise<void> {
  const config = loadConfig();
  const log = createLogger(config);
  if (!config.DATABASE_URL) throw new Error('DATABASE_URL: must point at the Lobewise database the server uses');
  // The server owns migrations; a worker only checks it can reach the tables.
  const database = await openDatabase(config, (m) => log.info(m), { migrate: false, poolSize: 4 });
  const runner = await startSweepRunner({ db: database.db, url: database.url, log, threads: config.SWEEP_THREADS, embedded: false, recoverEverySeconds: config.SWEEP_RECOVERY_SECONDS });
  process.stdout.write(`sweep worker ${runner.workerId} running with ${runner.pool.threads} thread(s)\n`);
  const shutdown = (signal: string) => {
    log.info(`${signal}: stopping the sweep worker`);
    runner
      .stop()
      .then(() => database.close())
      .then(
        () => process.exit(0),
        (err: unknown) => {
          process.stderr.write(`worker shutdown failed: ${String(err)}\n`);
          process.exit(1);
        },
      );
  };
  process.once('SIGTERM', () => shutdown('SIGTERM'));
  process.once('SIGINT', () => shutdown('SIGINT'));
}

main().catch((err: unknown) => {
  process.stderr.write(`sweep worker could not start: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
