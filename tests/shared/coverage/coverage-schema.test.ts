import { describe, expect, it } from 'vitest';
import { CoverageRequestSchema } from '../../../shared/schemas/coverage.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';

const design = { frequencyGHz: 28, nx: 4, ny: 2, dxMm: 5.35, phaseBits: 5, element: { kind: 'cosine', q: 1.5 }, channelPowerDbm: 10 };
const good = { modules: [{ design, orientation: 'front', beams: [{ azDeg: 10, elDeg: 0 }] }], region: { kind: 'sphere' }, percentiles: [50] };
const first = (body: unknown) => {
  const r = CoverageRequestSchema.safeParse(body);
  return r.success ? 'ok' : formatIssue(r.error);
};

describe('CoverageRequestSchema', () => {
  it('expands a grid codebook to its beam list and defaults the percentiles to the median', () => {
    const r = CoverageRequestSchema.parse({ ...good, percentiles: undefined, modules: [{ ...good.modules[0], beams: { grid: 'az -15:15:15 × el 0' } }] });
    expect(r.modules[0]!.beams).toEqual([{ azDeg: -15, elDeg: 0 }, { azDeg: 0, elDeg: 0 }, { azDeg: 15, elDeg: 0 }]);
    expect(r.percentiles).toEqual([50]);
  });

  it('names the field and the rule for bad input', () => {
    expect(first({ ...good, modules: [] })).toBe('modules: must hold at least one module');
    expect(first({ ...good, modules: [{ ...good.modules[0], orientation: 'side' }] })).toMatch(/^modules\[0\]\.orientation: must be one of "front"/);
    expect(first({ ...good, modules: [{ ...good.modules[0], beams: [{ azDeg: 95, elDeg: 0 }] }] })).toMatch(/^modules\[0\]\.beams\[0\]\.azDeg: must be a number from -90 to 90/);
    expect(first({ ...good, modules: [{ ...good.modules[0], beams: { grid: 'az 0' } }] })).toMatch(/^modules\[0\]\.beams\.grid: must be "az START/);
    expect(first({ ...good, modules: [{ ...good.modules[0], design: { ...design, channelPowerDbm: null } }] })).toMatch(/^modules\[0\]\.design\.channelPowerDbm: must be set/);
    expect(first({ ...good, modules: [{ ...good.modules[0], design: { ...design, grouping: 'column' }, beams: [{ azDeg: 0, elDeg: 5 }] }] })).toMatch(/^modules\[0\]\.beams\[0\]\.elDeg: must be 0 with column grouping/);
    expect(first({ ...good, region: { kind: 'sector', azMinDeg: 10, azMaxDeg: -10, elMinDeg: 0, elMaxDeg: 10 } })).toBe('region.azMaxDeg: must be greater than azMinDeg');
    expect(first({ ...good, region: { kind: 'cone' } })).toMatch(/^region\.kind: must be a region/);
    expect(first({ ...good, percentiles: [50, 101] })).toMatch(/^percentiles\[1\]: must be a number from 0 to 100/);
    expect(first({ ...good, stepDeg: 0.1 })).toMatch(/^stepDeg: must be a number from 0.25 to 5/);
    expect(first({ ...good, extra: 1 })).toBe('extra: is not a known field');
    expect(first({ ...good, modules: [{ ...good.modules[0], beams: { fill: { region: { kind: 'sphere' }, crossoverDb: 0 } } }] })).toMatch(/^modules\[0\]\.beams\.fill\.crossoverDb: must be a number from 0\.1 to 30/);
    expect(first({ ...good, modules: [{ ...good.modules[0], beams: { fill: { crossoverDb: 3 } } }] })).toMatch(/^modules\[0\]\.beams\.fill\.region: must be a region/);
  });

  it('refuses more work than one computation should take', () => {
    const beams = Array.from({ length: 128 }, (_, i) => ({ azDeg: -63.5 + i, elDeg: 0 }));
    const heavy = { ...good, modules: [{ design, orientation: 'front', beams }, { design, orientation: 'back', beams }], stepDeg: 0.25 };
    expect(first(heavy)).toMatch(/^stepDeg: is too much work \(4\.2 × 10⁹ units/);
    const { stepDeg: _auto, ...unstepped } = heavy;
    const big = { ...unstepped, modules: [{ design: { ...design, nx: 64, ny: 64 }, orientation: 'front', beams }] };
    expect(first(big)).toMatch(/^modules: is too much work .*set a coarser stepDeg$/);
  });
});
