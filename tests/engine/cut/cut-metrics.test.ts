import { describe, expect, it } from 'vitest';
import { cutMetrics } from '../../../shared/engine/cut/cut-metrics.ts';
import { cutAngle } from '../../../shared/engine/cut/cut-samples.ts';

describe('cutMetrics(f, samples, …) combines the edges and the side lobes', () => {
  it('a cos² θ cut has a 90° HPBW, is not clipped and has no side lobe', () => {
    const f = (a: number) => Math.cos(a) ** 2;
    const s = Float64Array.from({ length: 181 }, (_, i) => f(cutAngle(i, 181)));
    const m = cutMetrics(f, s, 181, 0, 1);
    expect(m.hpbwDeg).toBeCloseTo(90, 6);
    expect(m.clipped).toBe(false);
    expect(m.sllDb).toBeNull();
  });
});
