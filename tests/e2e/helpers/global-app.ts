/**
 * Builds the client if stale and starts the real server (demo data seeded) on a free loopback port,
 * against the throw-away PostgreSQL from the first global setup.
 */
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildClientIfStale } from '../../../server/client-build.ts';
import { loadConfig } from '../../../server/config.ts';
import { startServer } from '../../../server/index.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    appUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const root = process.cwd();
  const clientDir = path.join(root, 'dist');
  await buildClientIfStale(root, clientDir, () => undefined);
  const config = loadConfig({
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    DATABASE_URL: project.getProvidedContext().databaseUrl,
    PORT: '0',
    SMTP_FAKE_PORT: '0',
    SESSION_SECRET: 'e2e-secret-0123456789abcdef',
  });
  const running = await startServer(config, { clientDir });
  project.provide('appUrl', running.url);
  return async () => {
    await running.close();
  };
}
