import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { beforeEach, describe, expect, it } from 'vitest';
import PassingDesigns from '@/components/trade/PassingDesigns.vue';
import MetricVsAngleChart from '@/components/charts/MetricVsAngleChart.vue';
import { tradeRow } from './trade-fixtures.ts';
import { stubMatchMedia } from '../helpers/jsdom.ts';

beforeEach(() => {
  stubMatchMedia();
});

describe('a design named the same way in every list', () => {
  it('the ranked list tells apart designs that differ only in phase bits, grouping or element', () => {
    const rows = [
      tradeRow(0, {}, { nx: 5, dxMm: 4.4, dyMm: 4.4, phaseBits: 3 }),
      tradeRow(1, {}, { nx: 5, dxMm: 4.4, dyMm: 4.4, phaseBits: 6 }),
      tradeRow(2, {}, { nx: 5, dxMm: 4.4, dyMm: 4.4, phaseBits: 6, element: { kind: 'tr38901' } }),
    ];
    const w = mount(PassingDesigns, { props: { rows, sheet: { maxChannels: 8 } }, global: { plugins: [Antd] } });
    const labels = w.findAll('ol li .label').map((l) => l.text());
    expect(labels).toHaveLength(3);
    expect(new Set(labels).size).toBe(3);
    expect(labels).toContain('5×1, 4.4 mm pitch, uniform, 3-bit, per element, cosine q=1 element');
  });

  it('adds the frequency when the listed designs differ in frequency', () => {
    const rows = [tradeRow(0, {}, { frequencyGHz: 28 }), tradeRow(1, {}, { frequencyGHz: 39 })];
    const w = mount(PassingDesigns, { props: { rows, sheet: { maxChannels: 8 } }, global: { plugins: [Antd] } });
    const labels = w.findAll('ol li .label').map((l) => l.text());
    expect(labels.some((l) => l.endsWith('28 GHz'))).toBe(true);
    expect(labels.some((l) => l.endsWith('39 GHz'))).toBe(true);
  });

  it('a chart legend with design descriptions puts one series per line', () => {
    const series = [
      { label: '#0: 5×1, 4.4 mm pitch, uniform, 3-bit, per element, isotropic element', points: [{ x: 0, y: 1 }, { x: 10, y: 2 }] },
      { label: '#1: 5×1, 4.4 mm pitch, uniform, 6-bit, per element, isotropic element', points: [{ x: 0, y: 2 }, { x: 10, y: 3 }] },
    ];
    const w = mount(MetricVsAngleChart, { props: { series, xTitle: 'Steer azimuth (°)', yTitle: 'HPBW az (°)' } });
    const texts = w.findAll('svg text').map((t) => t.text());
    expect(texts).toContain(series[0]!.label);
    const legends = w.findAll('svg > g').filter((g) => g.find('rect').exists() && g.text().startsWith('#'));
    const ys = legends.map((g) => g.attributes('transform'));
    expect(new Set(ys).size).toBe(2);
    expect(ys.every((t) => t!.startsWith(`translate(62,`))).toBe(true);
  });
});
