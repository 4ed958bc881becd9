import type { ArrayModel } from '../array/array-model.ts';

/** Autocorrelation R(a) = Σ_m x_{m+a}·conj(x_m) of a line, a = -(n-1)..n-1, stored at a + n - 1. */
function lineAutocorrelation(re: Float64Array, im: Float64Array, n: number): { re: Float64Array; im: Float64Array } {
  const outRe = new Float64Array(2 * n - 1);
  const outIm = new Float64Array(2 * n - 1);
  for (let a = -(n - 1); a < n; a++) {
    let sr = 0;
    let si = 0;
    for (let m = Math.max(0, -a); m < n && m + a < n; m++) {
      sr += re[m + a]! * re[m]! + im[m + a]! * im[m]!;
      si += im[m + a]! * re[m]! - re[m + a]! * im[m]!;
    }
    outRe[a + n - 1] = sr;
    outIm[a + n - 1] = si;
  }
  return { re: outRe, im: outIm };
}

/**
 * Total radiated power ∮ |AF|²·E dΩ = Σ_{a,b} Re R(a, b)·G(|a|, |b|), R the 2-D excitation
 * autocorrelation (a product of line autocorrelations when the model is separable).
 */
export function radiatedPower(model: ArrayModel, kernel: Float64Array): number {
  const { nx, ny } = model;
  let total = 0;
  if (model.separable) {
    const rx = lineAutocorrelation(model.xRe, model.xIm, nx);
    const ry = lineAutocorrelation(model.yRe, model.yIm, ny);
    for (let a = -(nx - 1); a < nx; a++) {
      const xr = rx.re[a + nx - 1]!;
      const xi = rx.im[a + nx - 1]!;
      for (let b = -(ny - 1); b < ny; b++) {
        const re = xr * ry.re[b + ny - 1]! - xi * ry.im[b + ny - 1]!;
        total += re * kernel[Math.abs(a) * ny + Math.abs(b)]!;
      }
    }
    return total;
  }
  const { cRe, cIm } = model;
  // R(a, b) for a ≥ 0; R(-a, -b) = conj R(a, b) doubles the rest.
  for (let a = 0; a < nx; a++) {
    for (let b = -(ny - 1); b < ny; b++) {
      if (a === 0 && b < 0) continue;
      let sr = 0;
      for (let n = Math.max(0, -b); n < ny && n + b < ny; n++) {
        for (let m = 0; m + a < nx; m++) {
          const i = (n + b) * nx + m + a;
          const j = n * nx + m;
          sr += cRe[i]! * cRe[j]! + cIm[i]! * cIm[j]!;
        }
      }
      total += (a === 0 && b === 0 ? 1 : 2) * sr * kernel[a * ny + Math.abs(b)]!;
    }
  }
  return total;
}
