import type { Element } from '../../schemas/design.ts';
import { createMemo } from '../util/memo.ts';
import { cosineKernel } from './cosine-kernel.ts';
import { isotropicKernel } from './isotropic-kernel.ts';
import { tr38901Kernel } from './tr38901-kernel.ts';

const memo = createMemo<Float64Array>(64);

/**
 * G[a·ny + b] = ∮ E(Ω)·exp(j·k·(a·dx·u + b·dy·v)) dΩ for element offsets a, b ≥ 0: with it,
 * ∮ P dΩ = Σ R(a, b)·G(|a|, |b|) over the excitation autocorrelation R. Depends on geometry and element
 * only, so a sweep computes it once per geometry.
 */
export function pairKernel(element: Element, nx: number, ny: number, kdx: number, kdy: number): Float64Array {
  return memo.get(`${JSON.stringify(element)}|${nx}|${ny}|${kdx}|${kdy}`, () => {
    switch (element.kind) {
      case 'isotropic':
        return isotropicKernel(nx, ny, kdx, kdy);
      case 'cosine':
        return cosineKernel(nx, ny, kdx, kdy, element.q);
      case 'tr38901':
        return tr38901Kernel(nx, ny, kdx, kdy);
      case 'table':
        throw new RangeError('a table element has a complex kernel (tableKernel)');
    }
  });
}
