import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import TargetSheetEditor from '@/components/targets/TargetSheetEditor.vue';
import { TARGET_PRESETS } from '@shared/targets/presets.ts';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => vi.unstubAllGlobals());

function server() {
  const puts: unknown[] = [];
  vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
    const key = `${init?.method ?? 'GET'} ${url}`;
    if (url === '/api/auth/csrf') return json(200, { token: 't' });
    if (key === 'GET /api/studies/s1/target-sheet') return json(200, { studyId: 's1', preset: null, presetName: null, sheet: {}, updatedAt: null });
    if (key === 'GET /api/target-presets') return json(200, TARGET_PRESETS);
    if (key === 'PUT /api/studies/s1/target-sheet') {
      const body = JSON.parse(String(init!.body));
      puts.push(body);
      return json(200, { studyId: 's1', presetName: null, updatedAt: 'now', ...body });
    }
    throw new Error(`unexpected request ${key}`);
  }));
  return puts;
}

describe('TargetSheetEditor', () => {
  it('fills every limit from a preset, shows its source notes, and saves it', async () => {
    const puts = server();
    const w = mount(TargetSheetEditor, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] } });
    await flushPromises();
    w.findAllComponents({ name: 'ASelect' })[0]!.vm.$emit('update:value', 'handset-28ghz');
    await flushPromises();
    expect((w.find('input[aria-label="Min peak EIRP (dBm)"]').element as HTMLInputElement).value).toBe('22.4');
    expect(w.text()).toContain('3GPP TS 38.101-2 Table 6.2.1.3-1');
    expect(w.text()).toMatch(/invented/);
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(puts[0]).toMatchObject({ preset: 'handset-28ghz', sheet: { minPeakEirpDbm: 22.4, maxChannels: 8 } });
  });

  it('names a bad limit beside it and will not save', async () => {
    server();
    const w = mount(TargetSheetEditor, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] } });
    await flushPromises();
    await w.find('input[aria-label="Scan range az (°) minimum"]').setValue('30');
    await w.find('input[aria-label="Scan range az (°) maximum"]').setValue('-30');
    await flushPromises();
    expect(w.text()).toContain('scanAzDeg.min: min must not exceed max');
    expect(w.findAll('button').find((b) => b.text() === 'Save target sheet')!.attributes('disabled')).toBeDefined();
  });

  it('is read only for someone who may not edit', async () => {
    server();
    const w = mount(TargetSheetEditor, { props: { studyId: 's1', canEdit: false }, global: { plugins: [Antd] } });
    await flushPromises();
    expect(w.text()).toContain('Read only');
    expect(w.findAll('button').some((b) => b.text() === 'Save target sheet')).toBe(false);
  });
});
