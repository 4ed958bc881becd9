/**
 * What the served benches share: a throw-away PostgreSQL on loopback and a real server with the demo data,
 * configured as `npm start` runs it (production) plus the bench's own settings; with `client`, the built client
 * too (built first if stale, as `npm start` does, and served from a copy, so another build of dist/ meanwhile —
 * a test run, say — cannot pull files from under it). `stop()` closes both and removes every temporary folder.
 */
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildClientIfStale } from '../server/client-build.ts';
import { loadConfig, type Config } from '../server/config.ts';
import { startCluster } from '../server/db/cluster.ts';
import { freePort } from '../server/db/free-port.ts';
import { startServer } from '../server/index.ts';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export interface BenchServer {
  url: string;
  config: Config;
  stop(): Promise<void>;
}

export async function startBenchServer(name: string, options: { env?: Record<string, string>; client?: boolean } = {}): Promise<BenchServer> {
  const temp: string[] = [];
  const tempDir = (what: string) => {
    const dir = mkdtempSync(path.join(os.tmpdir(), `lobewise-bench-${what}-`));
    temp.push(dir);
    return dir;
  };
  const removeTemp = () => temp.forEach((d) => rmSync(d, { recursive: true, force: true }));
  let clientDir: string | undefined;
  if (options.client) {
    await buildClientIfStale(root, path.join(root, 'dist'), (m) => process.stdout.write(`${m}\n`));
    clientDir = tempDir('client');
    cpSync(path.join(root, 'dist'), clientDir, { recursive: true });
  }
  const cluster = await startCluster({ dataDir: tempDir(name), port: await freePort(), database: 'lobewise_bench', durable: false });
  const config = loadConfig({
    NODE_ENV: 'production', DATABASE_URL: cluster.url, PORT: '0', SMTP_FAKE_PORT: '0', LOG_LEVEL: 'warn', SESSION_SECRET: 'bench-secret-0123456789abcdef',
    ...options.env,
  });
  let server;
  try {
    server = await startServer(config, { clientDir });
  } catch (err) {
    await cluster.stop();
    removeTemp();
    throw err;
  }
  const running = server;
  return {
    url: running.url,
    config,
    stop: async () => {
      await running.close();
      await cluster.stop();
      removeTemp();
    },
  };
}
