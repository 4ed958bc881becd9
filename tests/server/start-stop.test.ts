import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort } from '../../server/db/free-port.ts';

// The real `npm start` entry, with its own PostgreSQL in a temporary DATA_DIR.
const dataDir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-start-'));
let httpPort = 0;
let pgPort = 0;

function postgresPids(): number[] {
  try {
    return execFileSync('pgrep', ['-f', path.join(dataDir, 'postgres', 'pgdata')]).toString().trim().split('\n').map(Number);
  } catch {
    return [];
  }
}

async function start(): Promise<{ child: ChildProcess; url: string }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/start.ts'], {
    env: { ...process.env, DATABASE_URL: '', DATA_DIR: dataDir, PORT: String(httpPort), PGPORT_LOBEWISE: String(pgPort), SEED_DEMO: 'false', LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`start timed out: ${out}`)), 120_000);
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
    child.once('exit', (code) => reject(new Error(`exited ${code}: ${out}`)));
  });
  return { child, url };
}

const exited = (child: ChildProcess) => new Promise<number | null>((r) => child.once('exit', (code) => r(code)));

afterAll(() => {
  for (const pid of postgresPids()) process.kill(pid, 'SIGKILL');
  rmSync(dataDir, { recursive: true, force: true });
});

describe('npm start', () => {
  it('serves the API with its own PostgreSQL and stops it on SIGTERM', async () => {
    httpPort = await freePort();
    pgPort = await freePort();
    const { child, url } = await start();
    const health = await fetch(`${url}/api/health`);
    expect(health.status).toBe(200);
    expect((await health.json()).database.reachable).toBe(true);
    const page = await fetch(`${url}/studies/anything`);
    expect(page.headers.get('content-type')).toMatch(/html/);
    expect(postgresPids().length).toBeGreaterThan(0);
    child.kill('SIGTERM');
    expect(await exited(child)).toBe(0);
    expect(postgresPids()).toEqual([]);
  }, 180_000);

  it('starts again after a crash left PostgreSQL and its postmaster.pid behind', async () => {
    const first = await start();
    first.child.kill('SIGKILL'); // no chance to stop PostgreSQL
    await exited(first.child);
    expect(postgresPids().length).toBeGreaterThan(0);
    const second = await start();
    expect((await fetch(`${second.url}/api/health`)).status).toBe(200);
    second.child.kill('SIGTERM');
    expect(await exited(second.child)).toBe(0);
    expect(postgresPids()).toEqual([]);
  }, 240_000);
});
