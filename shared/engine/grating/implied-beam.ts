import type { ArrayModel } from '../array/array-model.ts';

/**
 * The beam direction (u, v) that the applied phases imply, from the weighted circular mean of the
 * phase step between neighbours: u = -mean(Δφx)/(k·dx). It may lie outside the visible disk when the
 * progressive phase exceeds 360·d/λ degrees.
 */
export function impliedBeam(model: ArrayModel): { u: number; v: number } {
  const { nx, ny, cRe, cIm } = model;
  let xr = 0;
  let xi = 0;
  let yr = 0;
  let yi = 0;
  for (let n = 0; n < ny; n++) {
    for (let m = 0; m < nx; m++) {
      const i = n * nx + m;
      // c_next·conj(c_here) carries the phase step, weighted by both amplitudes.
      if (m + 1 < nx) {
        xr += cRe[i + 1]! * cRe[i]! + cIm[i + 1]! * cIm[i]!;
        xi += cIm[i + 1]! * cRe[i]! - cRe[i + 1]! * cIm[i]!;
      }
      if (n + 1 < ny) {
        yr += cRe[i + nx]! * cRe[i]! + cIm[i + nx]! * cIm[i]!;
        yi += cIm[i + nx]! * cRe[i]! - cRe[i + nx]! * cIm[i]!;
      }
    }
  }
  return {
    u: nx > 1 ? -Math.atan2(xi, xr) / model.kdx : 0,
    v: ny > 1 ? -Math.atan2(yi, yr) / model.kdy : 0,
  };
}
