import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import CandidatesPanel from '@/components/candidate/CandidatesPanel.vue';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => vi.unstubAllGlobals());

describe('CandidatesPanel autosave', () => {
  it('saves an edit at once when the tab closes before the save delay has passed', async () => {
    const saved: unknown[] = [];
    const candidate = { id: 'c1', studyId: 's1', name: 'Row', position: 0, notes: '', createdAt: '', updatedAt: '', design: { frequencyGHz: 28, nx: 4, dxMm: 5 } };
    vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
      const key = `${init?.method ?? 'GET'} ${url}`;
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (key === 'GET /api/studies/s1/candidates') return json(200, [candidate]);
      if (key === 'PATCH /api/candidates/c1') {
        saved.push(JSON.parse(String(init!.body)));
        return json(200, candidate);
      }
      throw new Error(`unexpected request ${key}`);
    }));
    const w = mount(CandidatesPanel, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] }, attachTo: document.body });
    await flushPromises();
    await w.find('input[aria-label="Elements along x"]').setValue('16');
    await flushPromises();
    expect(saved).toEqual([]); // still inside the save delay
    w.unmount();
    await flushPromises();
    expect(saved.at(-1)).toMatchObject({ design: { nx: 16 } });
  }, 30_000);
});
