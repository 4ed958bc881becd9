import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import CandidatePreview from '@/components/candidate/CandidatePreview.vue';
import ChannelCodesTable from '@/components/candidate/ChannelCodesTable.vue';
import { computePreview } from '@/workers/preview-compute';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});
vi.setConfig({ testTimeout: 30_000 });

describe('a candidate with many channels', () => {
  it('lists its 64 phase codes in their own table, not in a metric cell', async () => {
    // 8 × 8 elements, one channel each, 6-bit phase: 64 codes.
    const result = computePreview({ design: { frequencyGHz: 28, nx: 8, ny: 8, dxMm: 5.35, phaseBits: 6, steerAzDeg: 20, channelPowerDbm: 10 } });
    if (!result.ok) throw new Error('expected a result');
    expect(result.metrics.codes).toHaveLength(64);
    const w = mount(CandidatePreview, {
      props: { name: 'Sixty-four', result, busy: false, error: null, overlay: null, sheet: null },
      global: { plugins: [Antd], stubs: { CutChart: true, PolarChart: true, ApertureChart: true } },
    });
    const cells = w.findAll('.metrics .value').map((c) => c.text());
    expect(cells.length).toBeGreaterThan(10);
    expect(cells.every((c) => c.length < 60), 'no metric cell holds a list of codes').toBe(true);
    expect(cells).toContain('64 codes (listed below)');
    const table = w.findComponent(ChannelCodesTable);
    expect(table.exists()).toBe(true);
    expect(table.text()).toContain('64 channels, 6-bit');
    // The block opens on demand.
    await w.find('.ant-collapse-header').trigger('click');
    const rows = w.findAll('.codes tbody tr');
    expect(rows).toHaveLength(64);
    // Phase of a code = code × 360° / 2^6 = code × 5.625° (the definition of a 6-bit code).
    const [, code, phase] = rows[5]!.findAll('td').map((td) => td.text());
    expect(Number(phase)).toBeCloseTo(Number(code) * 5.625, 2);
    expect(w.findAll('.codes th').map((t) => t.text())).toEqual(['Channel', 'Code', 'Phase (°)']);
  });

  it('shows an attenuation column when attenuator settings are given', async () => {
    const w = mount(ChannelCodesTable, { props: { codes: [0, 8, 16], phaseBits: 5, attenuationDb: [0, 1.5, null] }, global: { plugins: [Antd] } });
    await w.find('.ant-collapse-header').trigger('click');
    expect(w.findAll('th').map((t) => t.text())).toContain('Attenuation (dB)');
    const last = w.findAll('tbody tr').at(-1)!.findAll('td').map((td) => td.text());
    // 16 × 360° / 2^5 = 180°.
    expect(last).toEqual(['3', '16', '180.00', '—']);
  });
});
