import type { ArrayModel } from './array-model.ts';

/**
 * Line weights b_m = Σ_n c_mn·exp(j·n·kdy·v) for a fixed v: an azimuth cut (constant el) then costs
 * O(nx) per angle. Writes into the given arrays (length nx).
 */
export function collapseRows(model: ArrayModel, v: number, outRe: Float64Array, outIm: Float64Array): void {
  const { nx, ny, cRe, cIm } = model;
  outRe.fill(0);
  outIm.fill(0);
  for (let n = 0; n < ny; n++) {
    const zr = Math.cos(n * model.kdy * v);
    const zi = Math.sin(n * model.kdy * v);
    for (let m = 0; m < nx; m++) {
      const i = n * nx + m;
      outRe[m] = outRe[m]! + cRe[i]! * zr - cIm[i]! * zi;
      outIm[m] = outIm[m]! + cRe[i]! * zi + cIm[i]! * zr;
    }
  }
}
