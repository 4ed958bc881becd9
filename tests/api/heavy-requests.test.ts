/**
 * Request-sized computations cannot stall the server: they run on the worker pool within a per-request work
 * budget (element·samples), one user has a capped number open at once (429 + Retry-After), work stops when the
 * client goes away, and /api/health keeps answering while one user sends the largest request the limits allow.
 * A real listening server and real HTTP connections, so a blocked event loop shows as health answers waiting.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { destroyRequestPool, requestPoolStats } from '../../server/compute/request-pool.ts';
import { patternWork } from '../../shared/compute/pattern-work.ts';
import { useApiTest } from '../helpers/app.ts';

// A budget of 1.5e8 element·samples: 18 designs of 64×64 (8.19e6 each), or 1,171 of 8×8 (1.28e5 each).
const BUDGET = 1.5e8;
const api = useApiTest({ env: { REQUEST_WORK_BUDGET: String(BUDGET), HEAVY_REQUESTS_PER_USER: '1', SWEEP_THREADS: '1' }, appPerFile: true, signIn: ['engineer', 'reviewer'] });

let server: Server;
let base = '';
let engineerToken = '';
let reviewerToken = '';

beforeAll(async () => {
  server = await new Promise<Server>((resolve) => {
    const s = api.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((r) => server.close(r));
  await destroyRequestPool();
});
beforeEach(async () => {
  engineerToken = (await api.engineer.post('/api/account/tokens').send({ name: 'heavy' })).body.token as string;
  reviewerToken = (await api.reviewer.post('/api/account/tokens').send({ name: 'heavy' })).body.token as string;
});

/** n different 8×8 designs (pitch varies, so no geometry is shared between them). */
const smallDesigns = (n: number) => Array.from({ length: n }, (_, i) => ({ frequencyGHz: 28, nx: 8, ny: 8, dxMm: 5 + i * 1e-4, dyMm: 5.2, steerAzDeg: i % 50, phaseBits: 6, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 } }));
const bigDesign = (i: number) => ({ frequencyGHz: 28, nx: 64, ny: 64, dxMm: 5 + i * 1e-3, dyMm: 5.35, steerAzDeg: 10 });

function post(path: string, token: string, body: unknown, signal?: AbortSignal): Promise<Response> {
  return fetch(`${base}${path}`, { method: 'POST', headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' }, body: JSON.stringify(body), signal });
}

async function until(check: () => boolean, what: string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

describe('per-request work budget', () => {
  it('refuses an evaluate list over the budget with 413 naming the body, before any work runs', async () => {
    const designs = Array.from({ length: 19 }, (_, i) => bigDesign(i));
    expect(designs.reduce((s, d) => s + patternWork(d), 0)).toBeGreaterThan(BUDGET);
    const before = requestPoolStats().completed;
    const res = await post('/api/evaluate', engineerToken, designs);
    expect(res.status).toBe(413);
    const body = (await res.json()) as { error: { code: string; message: string; fields: { field: string }[] } };
    expect(body.error.code).toBe('too_much_work');
    expect(body.error.message).toMatch(/^body: asks for 1\.56e\+8 element·samples of work; one request may ask for at most 1\.50e\+8/);
    expect(body.error.fields[0]!.field).toBe('body');
    expect(requestPoolStats().completed).toBe(before);
  });

  it('refuses bench codes, squint and Monte Carlo over the budget, naming beams, points and trials', async () => {
    const studyId = (await api.engineer.post('/api/studies').send({ name: 'Budget' })).body.id as string;
    const cand = await api.engineer.post(`/api/studies/${studyId}/candidates`).send({ name: 'Big panel', design: { frequencyGHz: 28, nx: 64, ny: 64, dxMm: 5.35, phaseBits: 6 } });
    expect(cand.status).toBe(201);
    const id = cand.body.id as string;
    // 64×64: 8.19e6 element·samples a pattern, so 19 beams, 19 points or 18 trials (+ the ideal beam) pass 1.5e8.
    const codes = await post(`/api/candidates/${id}/codes`, engineerToken, { beams: '-90:90:10' });
    expect(codes.status).toBe(413);
    expect(((await codes.json()) as { error: { message: string } }).error.message).toMatch(/^beams: asks for/);
    const squint = await post(`/api/candidates/${id}/squint`, engineerToken, { beam: { azDeg: 30 }, band: 'n257', points: 31 });
    expect(squint.status).toBe(413);
    expect(((await squint.json()) as { error: { message: string } }).error.message).toMatch(/^points: asks for/);
    const mc = await post(`/api/candidates/${id}/monte-carlo`, engineerToken, { trials: 500 });
    expect(mc.status).toBe(413);
    expect(((await mc.json()) as { error: { message: string } }).error.message).toMatch(/^trials: asks for/);
  });
});

describe('heavy requests per user, cancellation and health', () => {
  it('a second heavy request from the same user answers 429 with Retry-After; another user is not refused', async () => {
    const first = post('/api/evaluate', engineerToken, smallDesigns(600));
    await until(() => requestPoolStats().running > 0, 'the first request to reach the pool');
    const second = await post('/api/evaluate', engineerToken, smallDesigns(1));
    expect(second.status).toBe(429);
    expect(Number(second.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(((await second.json()) as { error: { code: string } }).error.code).toBe('too_many_heavy_requests');
    const other = await post('/api/evaluate', reviewerToken, smallDesigns(1));
    expect(other.status).toBe(200);
    const done = await first;
    expect(done.status).toBe(200);
    expect(((await done.json()) as unknown[]).length).toBe(600);
    // Once the first has answered, the same user may go again.
    expect((await post('/api/evaluate', engineerToken, smallDesigns(1))).status).toBe(200);
  }, 120_000);

  it('stops the work when the client goes away, and frees the user for the next request', async () => {
    const before = requestPoolStats();
    const abort = new AbortController();
    const gone = post('/api/evaluate', engineerToken, smallDesigns(1100), abort.signal).catch((err: unknown) => err);
    await until(() => requestPoolStats().running > before.running, 'the request to reach the pool');
    abort.abort();
    expect(await gone).toBeInstanceOf(Error);
    await until(() => requestPoolStats().running === before.running, 'the pool task to end');
    const after = requestPoolStats();
    expect(after.cancelled).toBe(before.cancelled + 1);
    expect(after.completed).toBe(before.completed); // ended by the abort, not by finishing
    expect((await post('/api/evaluate', engineerToken, smallDesigns(1))).status).toBe(200);
  }, 120_000);

  it('keeps answering /api/health while one user sends the largest request the limits allow', async () => {
    // The largest allowed work: as many 8×8 designs as the budget takes (the most the event loop has to validate).
    const n = Math.floor(BUDGET / patternWork({ nx: 8, ny: 8 }));
    let heavyDoneAt = 0;
    const heavy = post('/api/evaluate', engineerToken, smallDesigns(n)).then(async (res) => {
      const body = (await res.json()) as unknown[];
      heavyDoneAt = performance.now();
      return { status: res.status, count: body.length };
    });
    await until(() => requestPoolStats().running > 0, 'the heavy request to reach the pool');
    const healthAnswers: { sentAt: number; answeredAt: number; status: number }[] = [];
    while (heavyDoneAt === 0 && healthAnswers.length < 200) {
      const sentAt = performance.now();
      const res = await fetch(`${base}/api/health`);
      healthAnswers.push({ sentAt, answeredAt: performance.now(), status: res.status });
      await new Promise((r) => setTimeout(r, 50));
    }
    const result = await heavy;
    expect(result).toEqual({ status: 200, count: n });
    // Work inline on the event loop would hold every health request until the heavy one had answered;
    // on the pool, several health answers arrive while it is still running.
    const during = healthAnswers.filter((h) => h.answeredAt < heavyDoneAt);
    expect(during.length).toBeGreaterThanOrEqual(3);
    expect(during.every((h) => h.status === 200)).toBe(true);
    const worst = Math.max(...during.map((h) => h.answeredAt - h.sentAt));
    console.info(`[heavy] ${n} designs; ${during.length} health answers while it ran, slowest ${worst.toFixed(0)} ms`);
  }, 180_000);
});
