/** Starts a throw-away PostgreSQL in a temporary folder on a free loopback port for the api project. */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startCluster } from '../../server/db/cluster.ts';
import { freePort } from '../../server/db/free-port.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
    adminUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const dataDir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-test-'));
  const cluster = await startCluster({ dataDir, port: await freePort(), database: 'lobewise_test', durable: false });
  project.provide('databaseUrl', cluster.url);
  project.provide('adminUrl', cluster.adminUrl);
  return async () => {
    await cluster.stop();
    rmSync(dataDir, { recursive: true, force: true });
  };
}
