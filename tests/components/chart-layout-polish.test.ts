import { mount } from '@vue/test-utils';
import { describe, expect, it, vi } from 'vitest';
import PolarChart from '@/components/charts/PolarChart.vue';

vi.setConfig({ testTimeout: 30_000 });

describe('chart layout', () => {
  it('the polar plot keeps its ±90° labels inside the drawing', () => {
    const series = [{ name: 'a', anglesDeg: [-90, 0, 90], powerDb: [-30, 0, -30] }];
    const w = mount(PolarChart, { props: { series, title: 'Azimuth cut, polar', angleLabel: 'Azimuth' }, global: { stubs: { ChartSaveButtons: true } } });
    const width = Number(w.get('svg').attributes('viewBox')!.split(' ')[2]);
    // Half the width of "-90°" at 10 px type is about 11 px (4 characters × ~5.5 px, common practice for this font size).
    const HALF_LABEL = 12;
    for (const label of ['-90°', '90°']) {
      const t = w.findAll('svg text').find((x) => x.text() === label)!;
      const x = Number(t.attributes('x'));
      expect(x - HALF_LABEL, label).toBeGreaterThanOrEqual(0);
      expect(x + HALF_LABEL, label).toBeLessThanOrEqual(width);
    }
  });
});
