import { describe, expect, it } from 'vitest';
import { pairKernel } from '../../../shared/engine/directivity/pair-kernel.ts';

describe('pairKernel(element, …) picks the kernel of the element and reuses it', () => {
  it('returns the same table for the same geometry (memoised) and a different one for another element', () => {
    const a = pairKernel({ kind: 'cosine', q: 1 }, 3, 2, 2, 2);
    expect(pairKernel({ kind: 'cosine', q: 1 }, 3, 2, 2, 2)).toBe(a);
    expect(pairKernel({ kind: 'isotropic' }, 3, 2, 2, 2)).not.toBe(a);
    expect(pairKernel({ kind: 'isotropic' }, 3, 2, 2, 2)[0]).toBeCloseTo(4 * Math.PI, 12);
  });
});
