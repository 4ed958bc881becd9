import { describe, expect, it } from 'vitest';
import { DeviceCoverageError, deviceCoverage, deviceFigures, deviceRegion, moduleBeams } from '../../shared/devices/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { DeviceLayoutSchema } from '../../shared/schemas/device.ts';
import { HANDSET_28GHZ, SMALL_CELL_39GHZ } from '../../shared/targets/presets.ts';

const DESIGN = DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10 });
const C1 = '00000000-0000-4000-8000-000000000001';
const GRID = { kind: 'grid' as const, grid: 'az -45:45:15 × el 0' };
const layout = (faces: ('front' | 'back' | 'right' | 'left')[]) =>
  DeviceLayoutSchema.parse({ outline: { widthMm: 72, heightMm: 150, depthMm: 8 }, modules: faces.map((face) => ({ candidateId: C1, face, codebook: GRID })) });

describe('deviceRegion(sheet)', () => {
  it('judges the handset over the sphere and the small cell over its service sector', () => {
    expect(deviceRegion(HANDSET_28GHZ.sheet)).toEqual({ kind: 'sphere' });
    expect(deviceRegion(SMALL_CELL_39GHZ.sheet)).toEqual({ kind: 'sector', azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 });
    expect(deviceRegion(null)).toEqual({ kind: 'sphere' });
  });
});

describe('deviceFigures(result)', () => {
  it('gives the 50th percentile for a sphere and the minimum for a sector, nothing else', () => {
    const sphere = deviceFigures({ region: { kind: 'sphere' }, peakEirpDbm: 20, minEirpDbm: -5, eirpPercentilesDbm: { '50': 9 } });
    expect(sphere).toMatchObject({ peakEirpDbm: 20, coverageP50EirpDbm: 9, sectorMinEirpDbm: null, channels: null });
    const sector = deviceFigures({ region: { kind: 'sector', azMinDeg: -50, azMaxDeg: 50, elMinDeg: -10, elMaxDeg: 10 }, peakEirpDbm: 50, minEirpDbm: 41, eirpPercentilesDbm: { '50': 46 } });
    expect(sector).toMatchObject({ peakEirpDbm: 50, coverageP50EirpDbm: null, sectorMinEirpDbm: 41 });
  });
});

describe('moduleBeams(design, rule)', () => {
  it('expands a grid (7 azimuths × 1 elevation) and drops elevation beams a column-grouped module cannot point', () => {
    expect(moduleBeams(DESIGN, GRID).beams).toHaveLength(7);
    const column = { ...DESIGN, grouping: 'column' as const };
    expect(moduleBeams(column, { kind: 'grid', grid: 'az -30:30:30 × el -10:10:10' }).beams).toEqual([
      { azDeg: -30, elDeg: 0 }, { azDeg: 0, elDeg: 0 }, { azDeg: 30, elDeg: 0 },
    ]);
  });
});

describe('deviceCoverage(input)', () => {
  it('covers more of the sphere with modules on opposite faces than with one (common practice, by construction)', () => {
    const one = deviceCoverage({ layout: layout(['front']), designs: { [C1]: DESIGN }, sheet: HANDSET_28GHZ.sheet, stepDeg: 3 });
    const two = deviceCoverage({ layout: layout(['front', 'back']), designs: { [C1]: DESIGN }, sheet: HANDSET_28GHZ.sheet, stepDeg: 3 });
    expect(two.coverage.eirpPercentilesDbm['50']!).toBeGreaterThan(one.coverage.eirpPercentilesDbm['50']! + 1);
    // Peak EIRP does not depend on how many faces carry the same module (0.1 dB: the engine's stated accuracy).
    expect(Math.abs(two.coverage.peakEirpDbm! - one.coverage.peakEirpDbm!)).toBeLessThan(0.1);
    expect(two.beamsTotal).toBe(14);
    // The handset sheet's spherical-coverage limit is judged on the device's own 50th percentile.
    expect(two.check!.limits.minCoverageP50EirpDbm!.value).toBe(two.coverage.eirpPercentilesDbm['50']);
    expect(two.check!.limits.minCoverageP50EirpDbm!.pass).toBe(two.coverage.eirpPercentilesDbm['50']! >= HANDSET_28GHZ.sheet.minCoverageP50EirpDbm!);
    // Limits a device has no figure for are not applicable, not failed.
    expect(two.check!.notApplicable).toContain('maxChannels');
  });

  it('reports progress per codebook and once for the coverage', () => {
    const steps: string[] = [];
    deviceCoverage({ layout: layout(['right', 'left']), designs: { [C1]: DESIGN }, sheet: null, stepDeg: 5 }, (d, t) => steps.push(`${d}/${t}`));
    expect(steps).toEqual(['1/3', '2/3', '3/3']);
  });

  it('names the module whose candidate is missing or cannot give EIRP', () => {
    expect(() => deviceCoverage({ layout: layout(['front']), designs: {}, sheet: null })).toThrow(new DeviceCoverageError('layout.modules[0].candidateId', 'names no candidate of this study'));
    const dark = { ...DESIGN, channelPowerDbm: null };
    expect(() => deviceCoverage({ layout: layout(['front']), designs: { [C1]: dark }, sheet: null })).toThrow(/layout\.modules\[0\]\.design\.channelPowerDbm/);
  });
});
