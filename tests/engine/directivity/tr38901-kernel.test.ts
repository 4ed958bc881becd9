import { describe, expect, it } from 'vitest';
import { tr38901Kernel } from '../../../shared/engine/directivity/tr38901-kernel.ts';
import { pairKernelByIntegral } from './sphere-integral.ts';

// 3GPP TR 38.901 Table 7.3-1, written out again here: A = 8 − min(12(el/65°)² + 12(az/65°)², 30) dBi.
const tr = (az: number, el: number) => {
  const a = (az * 180) / Math.PI / 65;
  const e = (el * 180) / Math.PI / 65;
  return 10 ** ((8 - Math.min(12 * a * a + 12 * e * e, 30)) / 10);
};

describe('tr38901Kernel(nx, ny, kdx, kdy)', () => {
  it('at zero offset is ∮ E dΩ of the Table 7.3-1 element, as a direct sphere integral gives it (±2e-4 relative)', () => {
    const direct = pairKernelByIntegral(tr, 0, 0);
    expect(Math.abs(tr38901Kernel(1, 1, 1, 1)[0]! / direct - 1)).toBeLessThanOrEqual(2e-4);
  });
  it('at offsets (0.5λ, 0) and (λ, 0.5λ) matches the direct integral (±5e-4 of the zero-offset value)', () => {
    const g = tr38901Kernel(3, 2, Math.PI, Math.PI);
    const g0 = pairKernelByIntegral(tr, 0, 0);
    expect(Math.abs(g[1 * 2 + 0]! - pairKernelByIntegral(tr, Math.PI, 0))).toBeLessThanOrEqual(5e-4 * g0);
    expect(Math.abs(g[2 * 2 + 1]! - pairKernelByIntegral(tr, 2 * Math.PI, Math.PI))).toBeLessThanOrEqual(5e-4 * g0);
  });
});
