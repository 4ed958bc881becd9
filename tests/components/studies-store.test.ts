import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiRequestError } from '@/api/client';
import { useStudiesStore, type StudyRow } from '@/stores/studies';
import { json } from '../helpers/jsdom.ts';

/** A fetch that answers the listed routes only; anything else fails the test. */
function fakeServer(routes: Record<string, (init?: RequestInit) => Response>) {
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    if (url === '/api/auth/csrf') return json(200, { token: 't' });
    const handler = routes[`${init?.method ?? 'GET'} ${url}`];
    if (!handler) throw new Error(`unexpected request ${init?.method ?? 'GET'} ${url}`);
    return handler(init);
  });
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

const row = (id: string, name: string): StudyRow => ({
  id, name, description: '', visibility: 'team', ownerId: 'u', ownerName: 'U', targetSheetPreset: null, targetSheetName: null,
  candidateCount: 0, sweepCount: 0, archivedAt: null, createdAt: '', updatedAt: '', sharedWith: [],
});

beforeEach(() => setActivePinia(createPinia()));
afterEach(() => vi.unstubAllGlobals());

describe('useStudiesStore', () => {
  it('names the file when it is not JSON, without calling the server', async () => {
    const fetch = fakeServer({});
    await expect(useStudiesStore().importText('{ nope')).rejects.toMatchObject({ message: 'file: is not valid JSON' });
    expect(fetch).not.toHaveBeenCalled();
  });

  it("passes on the server's field and rule for a bad study file", async () => {
    fakeServer({
      'POST /api/studies/import': () =>
        json(400, { error: { code: 'invalid_input', message: 'candidates[0].design.nx: must be an integer from 1 to 64', fields: [{ field: 'candidates[0].design.nx', message: 'must be an integer from 1 to 64' }] } }),
    });
    const err = await useStudiesStore().importText('{}').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiRequestError);
    expect((err as ApiRequestError).fields[0]!.field).toBe('candidates[0].design.nx');
  });

  it('puts a deleted study back when the server refuses', async () => {
    fakeServer({
      'GET /api/studies': () => json(200, [row('a', 'A'), row('b', 'B')]),
      'DELETE /api/studies/a': () => json(403, { error: { code: 'forbidden', message: 'reviewers can read studies but not change them' } }),
    });
    const store = useStudiesStore();
    await store.fetchList();
    await expect(store.remove('a')).rejects.toThrow('reviewers can read');
    expect(store.list.map((s) => s.id)).toEqual(['a', 'b']);
  });

  it('hides archived studies unless asked', async () => {
    fakeServer({ 'GET /api/studies': () => json(200, [row('a', 'A'), { ...row('b', 'B'), archivedAt: '2025-01-01T00:00:00Z' }]) });
    const store = useStudiesStore();
    await store.fetchList();
    expect(store.visible.map((s) => s.id)).toEqual(['a']);
    store.showArchived = true;
    expect(store.visible.map((s) => s.id)).toEqual(['a', 'b']);
  });
});
