/**
 * Faults the server must survive without a 500 or half-written data: PostgreSQL restarted under a running
 * server (its own cluster, so the shared test database is left alone), and an upload whose storage fails.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import pg from 'pg';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import type { AppContext } from '../../server/context.ts';
import { startCluster, type Cluster } from '../../server/db/cluster.ts';
import { freePort } from '../../server/db/free-port.ts';
import { startServer, type RunningServer } from '../../server/index.ts';
import { authed, seedTeam, type AuthedClient } from '../helpers/auth.ts';
import { openTestContext, truncateAll } from '../helpers/db.ts';

const DESIGN = { frequencyGHz: 28, nx: 4, ny: 2, dxMm: 5.35, phaseBits: 6 };
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Either a 200 or the clean "database away" answer; anything else (500, HTML, a dropped socket) is a fault. */
function cleanOutcome(res: request.Response | Error): string {
  if (res instanceof Error) return `socket error: ${res.message}`;
  if (res.status === 200 || res.status === 201) return 'ok';
  const code = (res.body as { error?: { code?: string } })?.error?.code;
  return res.status === 503 && code === 'database_unavailable' ? '503' : `${res.status} ${res.text.slice(0, 200)}`;
}

describe('PostgreSQL restarted while the server runs', () => {
  let dir: string;
  let cluster: Cluster;
  let server: RunningServer;
  let engineer: AuthedClient;
  let admin: pg.Client;

  beforeAll(async () => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-faults-'));
    cluster = await startCluster({ dataDir: dir, port: await freePort(), database: 'lobewise_faults', durable: false });
    const config = loadConfig({
      NODE_ENV: 'test',
      DATABASE_URL: cluster.url,
      PORT: '0',
      SMTP_FAKE_PORT: '0',
      SEED_DEMO: 'false',
      LOG_LEVEL: 'silent',
      SESSION_SECRET: 'faults-secret-0123456789',
    });
    server = await startServer(config);
    const team = await seedTeam(server.ctx.db);
    engineer = await authed(server.url as unknown as Express, team.engineer);
  });
  afterAll(async () => {
    await admin?.end().catch(() => undefined);
    await server?.close();
    await cluster?.stop();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  /** A superuser connection to the app's database, for locks and for watching what waits on them. */
  async function connectAdmin(): Promise<pg.Client> {
    const c = new pg.Client({ connectionString: cluster.adminUrl.replace(/\/postgres$/, '/lobewise_faults') });
    c.on('error', () => undefined); // it is killed by the restart on purpose
    await c.connect();
    return c;
  }

  async function waitForLockWaiters(watch: pg.Client, n: number): Promise<void> {
    const deadline = Date.now() + 15_000;
    for (;;) {
      const { rows } = await watch.query(`SELECT count(*)::int AS n FROM pg_stat_activity WHERE wait_event_type = 'Lock' AND usename = 'lobewise'`);
      if ((rows[0] as { n: number }).n >= n) return;
      if (Date.now() > deadline) throw new Error('the requests never reached the locked table');
      await sleep(50);
    }
  }

  it('answers 200 before, 503 JSON while it is away (in-flight requests included), and 200 again after', async () => {
    expect((await engineer.get('/api/studies')).status).toBe(200);
    const created = await engineer.post('/api/studies').send({ name: 'Before the restart' });
    expect(created.status).toBe(201);

    // An in-flight read and an in-flight multi-row write, both stuck behind locks when the server goes down.
    admin = await connectAdmin();
    const watch = await connectAdmin();
    await admin.query('BEGIN');
    await admin.query('LOCK TABLE candidates IN ACCESS EXCLUSIVE MODE');
    const candidates = Array.from({ length: 50 }, (_, i) => ({ name: `Imported ${i}`, design: DESIGN }));
    const importing = engineer
      .post('/api/studies/import')
      .send({ format: 'lobewise-study', version: 1, study: { name: 'Half import' }, candidates })
      .then((r) => r, (e: Error) => e);
    const reading = engineer.get(`/api/studies/${created.body.id}/candidates`).then((r) => r, (e: Error) => e);
    await waitForLockWaiters(watch, 2);

    // Requests keep arriving while PostgreSQL stops and starts.
    let restarting = true;
    const during: (request.Response | Error)[] = [];
    const traffic = (async () => {
      while (restarting) {
        during.push(await engineer.get('/api/studies').then((r) => r, (e: Error) => e));
        await sleep(25);
      }
    })();
    await cluster.restart();
    restarting = false;
    await traffic;

    expect(cleanOutcome(await importing)).toBe('503');
    expect(cleanOutcome(await reading)).toBe('503');
    const outcomes = during.map(cleanOutcome);
    expect(outcomes.filter((o) => o !== 'ok' && o !== '503'), 'answers other than 200 or 503 JSON').toEqual([]);
    expect(outcomes, 'no request landed while PostgreSQL was away').toContain('503');

    // Reconnects by itself: the pool drops dead connections and opens new ones.
    const deadline = Date.now() + 20_000;
    let after = await engineer.get('/api/studies');
    while (after.status !== 200 && Date.now() < deadline) {
      await sleep(200);
      after = await engineer.get('/api/studies');
    }
    expect(after.status).toBe(200);
    for (let i = 0; i < 5; i++) expect((await engineer.get('/api/studies')).status).toBe(200);

    // The import was one transaction: neither its study nor any of its 50 candidates survived.
    const names = (after.body as { name: string }[]).map((s) => s.name);
    expect(names).toContain('Before the restart');
    expect(names).not.toContain('Half import');
    const [{ n }] = (await server.ctx.db.query(`SELECT count(*)::int AS n FROM candidates WHERE name LIKE 'Imported %'`)) as [{ n: number }];
    expect(n).toBe(0);

    // And writes work again, the same import included.
    const again = await engineer.post('/api/studies/import').send({ format: 'lobewise-study', version: 1, study: { name: 'Whole import' }, candidates });
    expect(again.status).toBe(201);
    const [{ m }] = (await server.ctx.db.query(`SELECT count(*)::int AS m FROM candidates WHERE name LIKE 'Imported %'`)) as [{ m: number }];
    expect(m).toBe(50);
    await watch.end().catch(() => undefined);
  });
});

describe('an upload whose storage fails', () => {
  let ctx: AppContext;
  let engineer: AuthedClient;
  let candidateId: string;
  const csv = Buffer.from(`angle_deg,power_dB\n${Array.from({ length: 181 }, (_, i) => `${i - 90},${Math.max(-40, -0.02 * (i - 90) ** 2).toFixed(2)}`).join('\n')}\n`);
  const upload = () => engineer.post(`/api/candidates/${candidateId}/range-data`).field('azDeg', '0').attach('file', csv, 'run.csv');
  const stored = async () => ((await ctx.db.query(`SELECT count(*)::int AS n FROM range_uploads`)) as [{ n: number }])[0].n;

  beforeAll(async () => {
    ctx = await openTestContext();
    await truncateAll(ctx.db);
    const app = createApp(ctx);
    engineer = await authed(app, (await seedTeam(ctx.db)).engineer);
    const study = await engineer.post('/api/studies').send({ name: 'Range day' });
    candidateId = (await engineer.post(`/api/studies/${study.body.id}/candidates`).send({ name: 'Module', design: DESIGN })).body.id;
  });
  afterAll(async () => {
    await ctx.db.query(`DROP TRIGGER IF EXISTS faults_disk_full ON range_uploads`).catch(() => undefined);
    await ctx.db.query(`DROP FUNCTION IF EXISTS faults_disk_full()`).catch(() => undefined);
    await ctx.db.query(`GRANT INSERT ON range_uploads TO CURRENT_USER`).catch(() => undefined);
    await ctx?.db.destroy();
  });

  it('a full disk answers 507 JSON saying nothing was saved, and nothing is', async () => {
    // PostgreSQL's own disk_full condition (SQLSTATE 53100), raised where the row would be written.
    await ctx.db.query(`CREATE FUNCTION faults_disk_full() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'could not extend file: No space left on device' USING ERRCODE = 'disk_full'; END $$`);
    await ctx.db.query(`CREATE TRIGGER faults_disk_full BEFORE INSERT ON range_uploads FOR EACH ROW EXECUTE FUNCTION faults_disk_full()`);
    try {
      const before = await stored();
      const res = await upload();
      expect(res.status).toBe(507);
      expect(res.body.error.code).toBe('insufficient_storage');
      expect(res.body.error.message).toMatch(/nothing was saved/);
      expect(await stored()).toBe(before);
    } finally {
      await ctx.db.query(`DROP TRIGGER faults_disk_full ON range_uploads`);
      await ctx.db.query(`DROP FUNCTION faults_disk_full()`);
    }
    expect((await upload()).status).toBe(201);
  });

  it('a permission error answers a JSON 5xx naming the cause, and saves nothing', async () => {
    await ctx.db.query(`REVOKE INSERT ON range_uploads FROM CURRENT_USER`);
    try {
      const before = await stored();
      const res = await upload();
      expect(res.status).toBeGreaterThanOrEqual(500);
      expect(res.body.error.code).toBe('storage_permission');
      expect(res.body.error.message).toMatch(/permission/);
      expect(await stored()).toBe(before);
    } finally {
      await ctx.db.query(`GRANT INSERT ON range_uploads TO CURRENT_USER`);
    }
    expect((await upload()).status).toBe(201);
  });
});
