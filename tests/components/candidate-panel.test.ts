import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import CandidatesPanel from '@/components/candidate/CandidatesPanel.vue';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => vi.unstubAllGlobals());

describe('CandidatesPanel', () => {
  it('adds a candidate, previews it, and updates the preview and saves after an edit', async () => {
    const saved: unknown[] = [];
    let candidate: Record<string, unknown> | null = null;
    vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
      const key = `${init?.method ?? 'GET'} ${url}`;
      if (url === '/api/auth/csrf') return json(200, { token: 't' });
      if (key === 'GET /api/studies/s1/candidates') return json(200, candidate ? [candidate] : []);
      if (key === 'POST /api/studies/s1/candidates') {
        const body = JSON.parse(String(init!.body));
        candidate = { id: 'c1', studyId: 's1', position: 0, notes: '', createdAt: '', updatedAt: '', ...body };
        return json(201, candidate);
      }
      if (key === 'PATCH /api/candidates/c1') {
        const body = JSON.parse(String(init!.body));
        saved.push(body);
        return json(200, { ...candidate, ...body });
      }
      throw new Error(`unexpected request ${key}`);
    }));
    const w = mount(CandidatesPanel, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] }, attachTo: document.body });
    await flushPromises();
    expect(w.text()).toContain('No candidates yet');

    await w.findAll('button').find((b) => b.text() === 'Add candidate')!.trigger('click');
    await w.find('input[aria-label="New candidate name"]').setValue('Four-element row');
    await w.find('form.add').trigger('submit');
    await flushPromises();
    await wait(250);
    await flushPromises();
    expect(w.text()).toContain('Four-element row');
    const hpbw = () => w.findAll('.ant-descriptions-item-label').find((l) => l.text() === 'HPBW az')!.element.nextElementSibling!.textContent!;
    const before = hpbw();
    expect(before).toMatch(/°$/);
    expect(w.findAll('svg path[stroke]').length).toBeGreaterThan(0);

    // Doubling the elements along x narrows the beam (Balanis: HPBW ∝ 1/(N·d)).
    await w.find('input[aria-label="Elements along x"]').setValue('8');
    await wait(250);
    await flushPromises();
    expect(parseFloat(hpbw())).toBeLessThan(parseFloat(before) * 0.7);
    await wait(900);
    await flushPromises();
    expect(saved.at(-1)).toMatchObject({ design: { nx: 8 } });
    expect(w.text()).toContain('All changes saved');
    expect(w.text()).toContain('RF exposure');
    w.unmount();
  }, 30_000);
});
