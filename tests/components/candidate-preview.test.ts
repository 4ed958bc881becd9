import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { describe, expect, it } from 'vitest';
import SheetCheckList from '@/components/targets/SheetCheckList.vue';
import { computeMain, computePreview, needsScan, scanAngles, scanFigures } from '@/workers/preview-compute';
import { DesignSchema } from '@shared/schemas/design.ts';

describe('computePreview (what the preview worker answers)', () => {
  const design = { frequencyGHz: 28, nx: 4, dxMm: 5.35, steerAzDeg: 20, channelPowerDbm: 10 };

  it('gives 0 dB at the peak of each cut and the taper weights per axis', () => {
    const r = computePreview({ design: { ...design, taperX: { kind: 'hamming' } } });
    if (!r.ok) throw new Error('expected a result');
    expect(Math.max(...r.cuts.az.powerDb)).toBeCloseTo(0, 1);
    expect(r.cuts.az.anglesDeg[0]).toBe(-90);
    expect(r.cuts.az.anglesDeg.at(-1)).toBe(90);
    const peakAt = r.cuts.az.anglesDeg[r.cuts.az.powerDb.indexOf(Math.max(...r.cuts.az.powerDb))]!;
    expect(Math.abs(peakAt - r.metrics.peakAzDeg)).toBeLessThan(0.5);
    expect(r.weights.x).toHaveLength(4);
    expect(Math.max(...r.weights.x)).toBe(1);
    expect(r.weights.x[0]).toBeLessThan(1);
    expect(r.weights.y).toEqual([1]);
  });

  it('answers the field and rule for an invalid design instead of throwing', () => {
    const r = computePreview({ design: { ...design, nx: 0 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields[0]).toEqual({ field: 'nx', message: 'must be an integer from 1 to 64' });
  });

  it('evaluates the sheet scan range every 10° and summarises the worst case', () => {
    const r = computePreview({ design, scanAzDeg: { min: -40, max: 40 } });
    if (!r.ok) throw new Error('expected a result');
    expect(r.scanPoints).toBe(9);
    expect([r.figures.scanAzMinDeg, r.figures.scanAzMaxDeg]).toEqual([-40, 40]);
    // Scanning off broadside widens the beam (Balanis: HPBW grows roughly as 1/cos θ0).
    expect(r.figures.hpbwAzMaxDeg!).toBeGreaterThan(r.figures.hpbwAzMinDeg!);
  });

  it('gives the same figures in two steps (as the worker answers) as in one', () => {
    const request = { design, scanAzDeg: { min: -30, max: 30 } };
    const main = computeMain(request);
    if (!main.ok) throw new Error('expected a result');
    expect(main.scanPoints).toBe(1);
    expect(needsScan(main, request)).toBe(true);
    expect(needsScan(main, { design })).toBe(false);
    expect(scanFigures(main.design, main.metrics, request).figures).toEqual((computePreview(request) as { figures: unknown }).figures);
  });

  it('steers only the axis the channel grouping can steer', () => {
    const col = DesignSchema.parse({ ...design, ny: 4, grouping: 'column' });
    const angles = scanAngles(col, { min: -20, max: 20 }, { min: -10, max: 10 });
    expect(angles.every(([, el]) => el === 0)).toBe(true);
    expect(angles.map(([az]) => az)).toEqual([-20, -10, 0, 10, 20]);
    expect(scanAngles(col, null, null)).toEqual([[20, 0]]);
  });
});

describe('SheetCheckList', () => {
  it('lists each limit the sheet sets with pass or fail', () => {
    const r = computePreview({ design: { frequencyGHz: 28, nx: 4, dxMm: 5.35, channelPowerDbm: 10 } });
    if (!r.ok) throw new Error('expected a result');
    const w = mount(SheetCheckList, {
      props: { sheet: { maxChannels: 2, maxApertureXMm: 30, minPeakEirpDbm: null }, figures: r.figures },
      global: { plugins: [Antd] },
    });
    const rows = w.findAll('tbody tr').map((tr) => tr.findAll('td').map((td) => td.text()));
    expect(rows).toEqual([
      ['Max aperture x (mm)', '21.4', '30', 'pass'],
      ['Max channels', '4', '2', 'fail'],
    ]);
    expect(w.text()).toContain('fails 1 of 2');
  });
});
