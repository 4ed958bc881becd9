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

type Row = { id: string; studyId: string; preset: string | null; presetName: string | null; sheet: Record<string, unknown>; position: number; updatedAt: string };

/** A fake API holding the study's sheets; records what was written. */
function server(initial: Row[] = []) {
  const puts: unknown[] = [];
  const rows = [...initial];
  vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
    const key = `${init?.method ?? 'GET'} ${url}`;
    if (url === '/api/auth/csrf') return json(200, { token: 't' });
    if (key === 'GET /api/studies/s1/target-sheets') return json(200, rows);
    if (key === 'GET /api/target-presets') return json(200, TARGET_PRESETS);
    if (key === 'POST /api/studies/s1/target-sheets') {
      const body = JSON.parse(String(init!.body));
      puts.push(body);
      const row = { id: `sheet-${rows.length + 1}`, studyId: 's1', presetName: null, position: rows.length, updatedAt: 'now', ...body };
      rows.push(row);
      return json(201, row);
    }
    const one = /^(PUT|DELETE) \/api\/studies\/s1\/target-sheets\/([\w-]+)$/.exec(key);
    if (one) {
      const i = rows.findIndex((r) => r.id === one[2]);
      if (one[1] === 'DELETE') {
        rows.splice(i, 1);
        return new Response(null, { status: 204 });
      }
      const body = JSON.parse(String(init!.body));
      puts.push(body);
      rows[i] = { ...rows[i]!, ...body };
      return json(200, rows[i]);
    }
    throw new Error(`unexpected request ${key}`);
  }));
  return puts;
}

const sheetRow = (id: string, name: string, position: number): Row => ({ id, studyId: 's1', preset: null, presetName: null, sheet: { name }, position, updatedAt: 'now' });

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

  it('shows one tab per sheet and saves the open one in place', async () => {
    const puts = server([sheetRow('a', 'Handset', 0), sheetRow('b', 'Small cell', 1)]);
    const w = mount(TargetSheetEditor, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] } });
    await flushPromises();
    expect(w.find('[data-sheet-tab="Handset"]').exists()).toBe(true);
    expect(w.find('[data-sheet-tab="Small cell"]').exists()).toBe(true);
    w.findComponent({ name: 'ATabs' }).vm.$emit('change', 'b');
    await flushPromises();
    expect((w.find('input[aria-label="Sheet name"]').element as HTMLInputElement).value).toBe('Small cell');
    await w.find('input[aria-label="Sheet name"]').setValue('Street cell');
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(puts[0]).toMatchObject({ sheet: { name: 'Street cell' } });
    expect(w.find('[data-sheet-tab="Street cell"]').exists()).toBe(true);
  });

  it('fills the power-class-3 values of a band and cites their tables', async () => {
    server([sheetRow('a', 'Handset', 0)]);
    const w = mount(TargetSheetEditor, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] } });
    await flushPromises();
    await w.find('select[aria-label="Band"]').setValue('n260');
    await flushPromises();
    // 3GPP TS 38.101-2 Tables 6.2.1.3-1 and 6.2.1.3-3, PC3 n260 (recalled from memory): 20.6 dBm peak, 8 dBm at the 50th percentile.
    expect((w.find('input[aria-label="Min peak EIRP (dBm)"]').element as HTMLInputElement).value).toBe('20.6');
    expect((w.find('input[aria-label="Spherical coverage: min EIRP at the 50th percentile (dBm)"]').element as HTMLInputElement).value).toBe('8');
    expect(w.text()).toContain('Table 6.2.1.3-3');
    expect(w.text()).toMatch(/recalled from memory/i);
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
