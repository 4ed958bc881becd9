import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { describe, expect, it } from 'vitest';
import CoverageCdfChart from '@/components/devices/CoverageCdfChart.vue';
import CoverageMapChart from '@/components/devices/CoverageMapChart.vue';
import DeviceSketch from '@/components/devices/DeviceSketch.vue';
import { requirementLine } from '@/components/devices/device-draft';
import { HANDSET_28GHZ, SMALL_CELL_39GHZ } from '@shared/targets/presets.ts';

const global = { plugins: [Antd] };

describe('device charts', () => {
  it('CDF: draws the requirement line and one marker per percentile', () => {
    const cdf = Array.from({ length: 11 }, (_, i) => ({ fraction: i / 10, eirpDbm: i * 2 }));
    const w = mount(CoverageCdfChart, {
      props: { cdf, percentiles: { '10': 2, '50': 10, '90': 18 }, requirement: { label: 'required at 50th', eirpDbm: 11.5, atPercent: 50 }, regionLabel: 'the whole sphere' },
      global,
    });
    expect(w.findAll('[data-test="percentile-marker"]')).toHaveLength(3);
    expect(w.find('[data-test="requirement-line"]').text()).toContain('11.5 dBm');
    expect(w.text()).toContain('50th: 10.0 dBm');
  });

  it('requirement: the 50th-percentile floor over the sphere, the sector floor over a sector', () => {
    expect(requirementLine(HANDSET_28GHZ.sheet, { kind: 'sphere' })).toEqual({ label: 'required at 50th', eirpDbm: HANDSET_28GHZ.sheet.minCoverageP50EirpDbm, atPercent: 50 });
    const sector = { kind: 'sector' as const, azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 };
    expect(requirementLine(SMALL_CELL_39GHZ.sheet, sector)?.eirpDbm).toBe(SMALL_CELL_39GHZ.sheet.minSectorEirpDbm);
    expect(requirementLine(null, sector)).toBeNull();
  });

  it('map: one cell per sample and a border where the serving module changes', () => {
    // 4 × 2 samples: modules 0 | 1 split down the middle of azimuth.
    const map = {
      azStepDeg: 10, elStepDeg: 10, azDeg: [-15, -5, 5, 15], elDeg: [-5, 5],
      eirpDbm: [1, 2, 3, 4, 5, 6, 7, null], module: [0, 0, 1, 1, 0, 0, 1, null], beam: [0, 1, 0, 1, 0, 1, 0, null],
    };
    const w = mount(CoverageMapChart, { props: { map, moduleLabels: ['M1', 'M2'] }, global });
    expect(w.findAll('rect title')).toHaveLength(8);
    const border = w.findAll('path')[0]!.attributes('d')!;
    // Two vertical segments at az 0 (one per elevation row), plus the edge of the unserved cell.
    expect(border.match(/V/g)!.length).toBeGreaterThanOrEqual(2);
    expect(w.text()).toContain('not served');
  });

  it('sketch: each module on its face', () => {
    const w = mount(DeviceSketch, {
      props: {
        outline: { widthMm: 72, heightMm: 150, depthMm: 8 },
        modules: [
          { face: 'right', u: 0.5, v: 0.7, label: 'M1', apertureXMm: 21.4, apertureYMm: 5 },
          { face: 'top', u: 0.5, v: 0.5, label: 'M2', apertureXMm: 10, apertureYMm: 5 },
        ],
      },
      global,
    });
    expect(w.findAll('[data-module]').map((g) => g.attributes('data-module'))).toEqual(['M1', 'M2']);
    expect(w.find('svg').attributes('aria-label')).toContain('M1 on the right, M2 on the top');
    expect(w.text()).toContain('side faces widened');
  });
});
