/** `npm start`: build the client if stale, start PostgreSQL, migrate, seed, serve, print the URL. */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildClientIfStale } from './client-build.ts';
import { loadConfig } from './config.ts';
import { startServer } from './index.ts';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const clientDir = path.join(root, 'dist');

async function main(): Promise<void> {
  const config = loadConfig({ NODE_ENV: 'production', ...process.env });
  await buildClientIfStale(root, clientDir, (m) => process.stdout.write(`${m}\n`));
  const running = await startServer(config, { clientDir });
  process.stdout.write(`\nLobewise is running at ${running.url}\n`);

  const shutdown = (signal: string) => {
    process.stdout.write(`\n${signal}: stopping…\n`);
    running.close().then(
      () => process.exit(0),
      (err: unknown) => {
        process.stderr.write(`shutdown failed: ${String(err)}\n`);
        process.exit(1);
      },
    );
  };
  process.once('SIGTERM', () => shutdown('SIGTERM'));
  process.once('SIGINT', () => shutdown('SIGINT'));
}

main().catch((err: unknown) => {
  process.stderr.write(`Lobewise could not start: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
