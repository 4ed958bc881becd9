import type { ArrayModel } from '../array/array-model.ts';
import type { ComplexKernel } from './table-kernel.ts';

/**
 * ∮ |AF|²·E dΩ = Σ_{a,b} Re[R(a, b)·G(a, b)] over signed offsets, R(a, b) = Σ c_(m+a, n+b)·conj(c_mn) the
 * excitation autocorrelation and G a complex kernel (an element without the mirror symmetries of the closed forms).
 */
export function complexRadiatedPower(model: ArrayModel, kernel: ComplexKernel): number {
  const { nx, ny, cRe, cIm } = model;
  const w2 = 2 * ny - 1;
  let total = 0;
  for (let a = -(nx - 1); a < nx; a++) {
    for (let b = -(ny - 1); b < ny; b++) {
      let sr = 0;
      let si = 0;
      for (let n = Math.max(0, -b); n < ny && n + b < ny; n++) {
        for (let m = Math.max(0, -a); m < nx && m + a < nx; m++) {
          const i = (n + b) * nx + m + a;
          const j = n * nx + m;
          sr += cRe[i]! * cRe[j]! + cIm[i]! * cIm[j]!;
          si += cIm[i]! * cRe[j]! - cRe[i]! * cIm[j]!;
        }
      }
      const k = (a + nx - 1) * w2 + b + ny - 1;
      total += sr * kernel.re[k]! - si * kernel.im[k]!;
    }
  }
  return total;
}
