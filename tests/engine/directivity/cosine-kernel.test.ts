import { describe, expect, it } from 'vitest';
import { cosineKernel } from '../../../shared/engine/directivity/cosine-kernel.ts';
import { pairKernelByIntegral } from './sphere-integral.ts';

const cosQ = (q: number) => (az: number, el: number) => {
  const w = Math.cos(az) * Math.cos(el);
  return w > 0 ? w ** q : 0;
};

describe('cosineKernel(nx, ny, kdx, kdy, q)', () => {
  // Balanis, Antenna Theory (3rd ed.), §2.7: U = cos^n θ over the front hemisphere radiates 2π/(n+1), so D = 2(n+1).
  for (const q of [0, 1, 1.5, 2, 6]) {
    it(`at zero offset is ∫ cos^${q} θ dΩ over the front hemisphere = 2π/(${q}+1) (±1e-12)`, () => {
      expect(cosineKernel(1, 1, 1, 1, q)[0]).toBeCloseTo((2 * Math.PI) / (q + 1), 12);
    });
  }
  for (const q of [1, 1.5, 4]) {
    it(`matches a direct sphere integral of cos^${q} θ·cos(k·r·u) at offsets 0.6λ and 2.1λ (±2e-4 relative)`, () => {
      const kd = 2 * Math.PI * 0.6;
      const g = cosineKernel(2, 2, kd, 2 * Math.PI * 2.1, q);
      const scale = (2 * Math.PI) / (q + 1);
      expect(Math.abs(g[1 * 2 + 0]! - pairKernelByIntegral(cosQ(q), kd, 0))).toBeLessThanOrEqual(2e-4 * scale);
      expect(Math.abs(g[1 * 2 + 1]! - pairKernelByIntegral(cosQ(q), kd, 2 * Math.PI * 2.1))).toBeLessThanOrEqual(2e-4 * scale);
    });
  }
  it('refuses a negative exponent', () => {
    expect(() => cosineKernel(1, 1, 1, 1, -1)).toThrow(RangeError);
  });
});
