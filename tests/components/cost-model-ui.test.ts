/**
 * The cost model in the browser: the candidate preview prices the design with the study's model (and judges the
 * sheet's cost limit), and the Cost and power tab edits and saves the model through the API.
 */
import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import CandidatePreview from '@/components/candidate/CandidatePreview.vue';
import CostModelEditor from '@/components/cost/CostModelEditor.vue';
import DeviceCostCard from '@/components/cost/DeviceCostCard.vue';
import { computePreview } from '@/workers/preview-compute';
import { DEMO_COST_MODEL } from '@shared/cost/index.ts';
import { DesignSchema } from '@shared/schemas/design.ts';
import { json, stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
  setActivePinia(createPinia());
});
afterEach(() => vi.unstubAllGlobals());
vi.setConfig({ testTimeout: 30_000 });

describe('candidate preview with a cost model', () => {
  // 1×4 at 5.35 mm, uniform, 10 dBm per channel.
  const result = computePreview({ design: { frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, steerAzDeg: 0, channelPowerDbm: 10 } });
  if (!result.ok) throw new Error('expected a result');
  const mountWith = (costModel: typeof DEMO_COST_MODEL | null, sheet: Record<string, unknown> | null = null) =>
    mount(CandidatePreview, {
      props: { name: '1×4', result, busy: false, error: null, overlay: null, sheet, costModel },
      global: { plugins: [Antd], stubs: { CutChart: true, PolarChart: true, ApertureChart: true, RfExposureEstimate: true } },
    });

  it('shows the module cost, chips and DC power the demo model gives', () => {
    const text = mountWith(DEMO_COST_MODEL).find('[data-test="cost-preview"]').text();
    // Hand-worked with the demo model: 1 chip × 18 + 4 × 0.4 + (21.4 + 4) × (5.35 + 4) mm² × 0.002 + 6 = 26.07 USD;
    // DC: 40 mW / 0.2 × 0.25 + 4 × 0.05 + 0.1 = 0.350 W.
    expect(text).toContain('26.07 USD');
    expect(text).toContain('0.350 W');
  });

  it('fails the sheet\'s cost limit in the check list', () => {
    // 26.07 (hand-worked above, printed to one decimal) is over a 25 limit; at 30 it passes.
    const row = (limit: number) => mountWith(DEMO_COST_MODEL, { maxCostUsd: limit }).findAll('.check tbody tr').map((r) => r.findAll('td').map((td) => td.text()));
    expect(row(25)).toEqual([['Max cost per module', '26.1', '25', 'fail']]);
    expect(row(30)[0]![3]).toBe('pass');
  });

  it('says so when the study has no model', () => {
    expect(mountWith(null).text()).toContain('No cost model yet');
  });
});

describe('CostModelEditor', () => {
  it('fills the invented demo values and saves them, showing the field notes', async () => {
    let saved: unknown = null;
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        if (url === '/api/auth/csrf') return json(200, { token: 't' });
        if (url === '/api/studies/s1/cost-model' && (init?.method ?? 'GET') === 'GET') return json(200, { studyId: 's1', model: null, version: null, updatedAt: null });
        if (url === '/api/studies/s1/cost-model' && init?.method === 'PUT') {
          saved = JSON.parse(String(init.body));
          return json(200, { studyId: 's1', model: saved, version: 1, updatedAt: '2026-12-01T00:00:00Z', repricedSweeps: 2 });
        }
        throw new Error(`unexpected request ${init?.method ?? 'GET'} ${url}`);
      }),
    );
    const w = mount(CostModelEditor, { props: { studyId: 's1', canEdit: true }, global: { plugins: [Antd] } });
    await flushPromises();
    expect(w.text()).toContain('no cost model yet');
    await w.find('[data-test="cost-demo"]').trigger('click');
    expect(w.text()).toContain('recalled from memory');
    expect(w.text()).toContain('invented');
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(saved).toEqual(DEMO_COST_MODEL);
    expect(w.text()).toContain('Version 1');
  });
});

describe('DeviceCostCard', () => {
  it('adds the modules of a device under the study model', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string) => {
        if (url === '/api/studies/s1/cost-model') return json(200, { studyId: 's1', model: DEMO_COST_MODEL, version: 1, updatedAt: '2026-12-01T00:00:00Z' });
        throw new Error(`unexpected request ${url}`);
      }),
    );
    const module = DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, channelPowerDbm: 10 });
    const w = mount(DeviceCostCard, { props: { studyId: 's1', designs: [module, module] }, global: { plugins: [Antd] } });
    await flushPromises();
    const text = w.find('[data-test="device-cost"]').text();
    // Hand-worked: two modules of 26.07498 (see tests/shared/cost-model.test.ts) = 52.15; 2 × 0.35 W = 0.70 W; 2 chips.
    expect(text).toContain('52.15 USD');
    expect(text).toContain('0.70 W');
    expect(text).toMatch(/Beamformer chips\s*2/);
  });
});
