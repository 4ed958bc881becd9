/**
 * The sweep progress stream re-checks access on every tick: a revoked share closes it (event: gone), and one user
 * can hold only EVENT_STREAMS_PER_USER streams at once (429 with Retry-After). Real HTTP on a listening server,
 * read as a stream, since a server-sent event stream never ends on its own.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Study } from '../../server/entities/study.ts';
import { authed, seedUser, type AuthedClient, type TestUser } from '../helpers/auth.ts';
import { useApiTest } from '../helpers/app.ts';

const api = useApiTest({ env: { EVENT_STREAMS_PER_USER: '2' }, appPerFile: true, signIn: ['engineer'] });

let server: Server;
let base = '';
beforeAll(async () => {
  server = await new Promise<Server>((resolve) => {
    const s = api.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((r) => server.close(r));
});

/** A private study of the engineer shared with a teammate, and a sweep in it that stays running (no runner). */
async function sharedRunningSweep(): Promise<{ studyId: string; sweepId: string; viewer: TestUser; viewerClient: AuthedClient }> {
  const viewer = await seedUser(api.ctx.db, api.team.team.id, 'engineer');
  const study = await api.ctx.db.getRepository(Study).save({ teamId: api.team.team.id, ownerId: api.team.engineer.id, name: 'Private panel', visibility: 'private' });
  const put = await api.engineer.put(`/api/studies/${study.id}/shares`).send({ visibility: 'private', shares: [{ userId: viewer.id, access: 'viewer' }] });
  expect(put.status).toBe(200);
  const [row] = (await api.ctx.db.query(
    `INSERT INTO sweeps (study_id, name, grid, status, points_total, designs_total, angles_per_design, chunks_total, engine_version)
     VALUES ($1, 'long', '{"frequencyGHz":28,"nx":4,"dxMm":5}', 'running', 100, 100, 1, 1, 'test') RETURNING id`,
    [study.id],
  )) as { id: string }[];
  return { studyId: study.id, sweepId: row!.id, viewer, viewerClient: await authed(api.app, viewer) };
}

/** Opens the stream with the client's session cookie; collects text until it ends or `stop` is aborted. */
function openStream(client: AuthedClient, sweepId: string, stop: AbortSignal) {
  const cookie = (client.agent as unknown as { jar: { getCookies(o: object): { toValueString(): string }[] } }).jar
    .getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false })
    .map((c) => c.toValueString())
    .join('; ');
  let text = '';
  let ended = false;
  const done = fetch(`${base}/api/sweeps/${sweepId}/events`, { headers: { cookie }, signal: stop }).then(async (res) => {
    if (res.status !== 200) {
      ended = true;
      return { status: res.status, retryAfter: res.headers.get('retry-after'), body: await res.text() };
    }
    const reader = res.body!.getReader();
    try {
      for (;;) {
        const { done: finished, value } = await reader.read();
        if (finished) break;
        text += new TextDecoder().decode(value);
      }
    } catch {
      /* aborted by the test */
    }
    ended = true;
    return { status: 200, retryAfter: null, body: text };
  });
  return { done, text: () => text, ended: () => ended };
}

async function until(check: () => boolean, what: string, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

describe('GET /api/sweeps/:id/events', () => {
  it('closes the stream of a viewer whose share is revoked, within a few ticks', async () => {
    const { studyId, sweepId, viewerClient } = await sharedRunningSweep();
    const stop = new AbortController();
    const stream = openStream(viewerClient, sweepId, stop.signal);
    try {
      await until(() => stream.text().includes('event: progress'), 'the first progress event');
      const revoke = await api.engineer.put(`/api/studies/${studyId}/shares`).send({ visibility: 'private', shares: [] });
      expect(revoke.status).toBe(200);
      // The poll is 500 ms; a stream that checked access only once would still be open after several seconds.
      await until(stream.ended, 'the stream to close after the revoke', 8_000);
      expect(stream.text()).toContain('event: gone');
      expect(stream.text()).not.toContain('event: end');
    } finally {
      stop.abort();
    }
  }, 30_000);

  it('caps the open streams per user with 429 and Retry-After, and frees a slot when a stream closes', async () => {
    const { sweepId } = await sharedRunningSweep();
    const stops = [new AbortController(), new AbortController(), new AbortController()];
    try {
      const a = openStream(api.engineer, sweepId, stops[0]!.signal);
      const b = openStream(api.engineer, sweepId, stops[1]!.signal);
      await until(() => a.text().includes('event: progress') && b.text().includes('event: progress'), 'two open streams');
      const third = await openStream(api.engineer, sweepId, stops[2]!.signal).done;
      expect(third.status).toBe(429);
      expect(Number(third.retryAfter)).toBeGreaterThan(0);
      expect(JSON.parse(third.body).error.code).toBe('too_many_streams');
      stops[0]!.abort();
      await a.done;
      // The server sees the disconnect and gives the slot back.
      let again: ReturnType<typeof openStream> | null = null;
      const stop = new AbortController();
      stops.push(stop);
      await until(() => {
        if (!again || (again.ended() && !again.text())) again = openStream(api.engineer, sweepId, stop.signal);
        return again.text().includes('event: progress');
      }, 'a new stream after one closed');
    } finally {
      for (const s of stops) s.abort();
    }
  }, 30_000);
});
