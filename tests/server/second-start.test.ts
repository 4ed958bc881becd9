/**
 * Two `npm start`s on one data folder: the second finds the first's live PostgreSQL, says so and exits non-zero,
 * touching nothing. The first keeps serving on the same postmaster, and a transaction it had open across the
 * second start commits (a stale-pid "cleanup" would have stopped the server and rolled it back).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort } from '../../server/db/free-port.ts';

const dataDir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-twice-'));
const children: ChildProcess[] = [];

function start(env: Record<string, string>): { child: ChildProcess; output: () => string; url: Promise<string> } {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/start.ts'], {
    env: { ...process.env, DATABASE_URL: '', DATA_DIR: dataDir, SEED_DEMO: 'false', LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  let out = '';
  const url = new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`start timed out: ${out}`)), 150_000);
    const onData = (d: Buffer) => {
      out += d.toString();
      const m = /running at (http:\/\/\S+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', onData);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`exited ${code}: ${out}`));
    });
  });
  url.catch(() => undefined);
  return { child, output: () => out, url };
}

const exited = (child: ChildProcess) =>
  child.exitCode !== null ? Promise.resolve(child.exitCode) : new Promise<number | null>((r) => child.once('exit', (code) => r(code)));
const postmasterPid = () => Number(readFileSync(path.join(dataDir, 'postgres', 'pgdata', 'postmaster.pid'), 'utf8').split('\n')[0]);

afterAll(async () => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGTERM');
  await Promise.all(children.map(exited));
  rmSync(dataDir, { recursive: true, force: true });
});

describe('a second npm start on the same data folder', () => {
  it('exits non-zero naming the running one; the first keeps its database and an open transaction commits', async () => {
    const httpPort = await freePort();
    const env = { PORT: String(httpPort), PGPORT_LOBEWISE: String(await freePort()) };
    const first = start(env);
    const url = await first.url;
    expect((await fetch(`${url}/api/health`)).status).toBe(200);
    const pidBefore = postmasterPid();

    // Work in flight in the first one's database while the second start runs.
    const creds = JSON.parse(readFileSync(path.join(dataDir, 'postgres', 'credentials.json'), 'utf8')) as { appPassword: string };
    const client = new pg.Client({ host: '127.0.0.1', port: Number(env.PGPORT_LOBEWISE), user: 'lobewise', password: creds.appPassword, database: 'lobewise' });
    await client.connect();
    try {
      await client.query('BEGIN');
      await client.query(`INSERT INTO teams (name) VALUES ('Written between the two starts')`);

      const second = start(env); // the same folder and ports, as a second `npm start` would have
      const code = await exited(second.child);
      expect(code).not.toBe(0);
      expect(second.output()).toContain(`Lobewise is already running from this folder on port ${httpPort}`);

      await client.query('COMMIT'); // fails if the first one's PostgreSQL was stopped meanwhile
    } finally {
      await client.end().catch(() => undefined);
    }
    expect(postmasterPid()).toBe(pidBefore);
    const health = await fetch(`${url}/api/health`);
    expect(health.status).toBe(200);
    expect((await health.json()).database.reachable).toBe(true);

    const check = new pg.Client({ host: '127.0.0.1', port: Number(env.PGPORT_LOBEWISE), user: 'lobewise', password: creds.appPassword, database: 'lobewise' });
    await check.connect();
    const rows = await check.query(`SELECT count(*)::int AS n FROM teams WHERE name = 'Written between the two starts'`);
    await check.end();
    expect(rows.rows[0].n).toBe(1);

    first.child.kill('SIGTERM');
    expect(await exited(first.child)).toBe(0);
  }, 300_000);
});
