import { describe, expect, it } from 'vitest';
import { isotropicKernel } from '../../../shared/engine/directivity/isotropic-kernel.ts';
import { pairKernelByIntegral } from './sphere-integral.ts';

describe('isotropicKernel(nx, ny, kdx, kdy)', () => {
  it('at zero offset is the sphere\'s solid angle, 4π', () => {
    expect(isotropicKernel(1, 1, 1, 1)[0]).toBeCloseTo(4 * Math.PI, 12);
  });
  // Balanis, Antenna Theory (3rd ed.), §6.4: at d = λ/2 (kd = π) the cross terms sin(kd·a)/(kd·a) vanish, which
  // is why a half-wave array of isotropic elements has directivity N.
  it('vanishes at every offset of a half-wave lattice (kd = π) (±1e-12)', () => {
    const g = isotropicKernel(4, 3, Math.PI, Math.PI);
    for (let a = 0; a < 4; a++) for (let b = 0; b < 3; b++) if (a + b > 0 && (a === 0 || b === 0)) expect(Math.abs(g[a * 3 + b]!)).toBeLessThanOrEqual(1e-12);
  });
  it('matches a direct sphere integral at offsets (2·0.7π, 0.9π) and (0, 1.3π) (±1e-4 relative to 4π)', () => {
    const g = isotropicKernel(3, 2, 0.7 * Math.PI, 0.9 * Math.PI);
    expect(Math.abs(g[2 * 2 + 1]! - pairKernelByIntegral(() => 1, 1.4 * Math.PI, 0.9 * Math.PI))).toBeLessThanOrEqual(4e-4 * Math.PI);
    const h = isotropicKernel(1, 2, 1, 1.3 * Math.PI);
    expect(Math.abs(h[1]! - pairKernelByIntegral(() => 1, 0, 1.3 * Math.PI))).toBeLessThanOrEqual(4e-4 * Math.PI);
  });
});
