import type { ArrayModel } from '../array/array-model.ts';
import { linePower } from '../array/line-power.ts';
import { elementGrid } from './element-grid.ts';

/** Candidate lobes for the peak: grid local maxima within 6 dB of the best, best first. */
const KEEP_RATIO = 0.25;
const MAX_CANDIDATES = 12;

// Reused between calls (each call overwrites every cell it reads): no 25 kB allocation per point.
let scratch = new Float64Array(0);

function gridPower(model: ArrayModel, nu: number, nv: number): Float64Array {
  if (scratch.length < nu * nv) scratch = new Float64Array(nu * nv);
  const out = scratch.subarray(0, nu * nv);
  const { nx, ny } = model;
  if (model.separable) {
    const py = new Float64Array(nv);
    for (let j = 0; j < nv; j++) py[j] = linePower(model.yRe, model.yIm, ny, model.kdy, -1 + (2 * j) / (nv - 1));
    for (let i = 0; i < nu; i++) {
      const px = linePower(model.xRe, model.xIm, nx, model.kdx, -1 + (2 * i) / (nu - 1));
      for (let j = 0; j < nv; j++) out[j * nu + i] = px * py[j]!;
    }
    return out;
  }
  // Two stages: row sums over m for each u, then a Horner sum over n for each v.
  const bRe = new Float64Array(ny);
  const bIm = new Float64Array(ny);
  const zy = new Float64Array(2 * nv);
  for (let j = 0; j < nv; j++) {
    const v = -1 + (2 * j) / (nv - 1);
    zy[2 * j] = Math.cos(model.kdy * v);
    zy[2 * j + 1] = Math.sin(model.kdy * v);
  }
  for (let i = 0; i < nu; i++) {
    const u = -1 + (2 * i) / (nu - 1);
    const zr = Math.cos(model.kdx * u);
    const zi = Math.sin(model.kdx * u);
    for (let n = 0; n < ny; n++) {
      let sr = model.cRe[n * nx + nx - 1]!;
      let si = model.cIm[n * nx + nx - 1]!;
      for (let m = nx - 2; m >= 0; m--) {
        const r = sr * zr - si * zi + model.cRe[n * nx + m]!;
        si = sr * zi + si * zr + model.cIm[n * nx + m]!;
        sr = r;
      }
      bRe[n] = sr;
      bIm[n] = si;
    }
    for (let j = 0; j < nv; j++) {
      const wr = zy[2 * j]!;
      const wi = zy[2 * j + 1]!;
      let tr = bRe[ny - 1]!;
      let ti = bIm[ny - 1]!;
      for (let n = ny - 2; n >= 0; n--) {
        const r = tr * wr - ti * wi + bRe[n]!;
        ti = tr * wi + ti * wr + bIm[n]!;
        tr = r;
      }
      out[j * nu + i] = tr * tr + ti * ti;
    }
  }
  return out;
}

/** Local maxima of P = |AF|²·E on an nu×nv u-v grid over the visible disk, as (u, v, power), best first. */
export function gridCandidates(model: ArrayModel, nu: number, nv: number): { u: number; v: number; power: number }[] {
  const p = gridPower(model, nu, nv);
  const e = elementGrid(model.element, model.elementKey, nu, nv);
  let best = 0;
  for (let k = 0; k < p.length; k++) {
    p[k] = e[k]! < 0 ? -1 : p[k]! * e[k]!;
    if (p[k]! > best) best = p[k]!;
  }
  const found: { u: number; v: number; power: number }[] = [];
  for (let j = 0; j < nv; j++) {
    for (let i = 0; i < nu; i++) {
      const x = p[j * nu + i]!;
      if (x < KEEP_RATIO * best || x <= 0) continue;
      let isMax = true;
      for (let dj = -1; dj <= 1 && isMax; dj++) {
        for (let di = -1; di <= 1; di++) {
          const ii = i + di;
          const jj = j + dj;
          if ((di === 0 && dj === 0) || ii < 0 || jj < 0 || ii >= nu || jj >= nv) continue;
          if (p[jj * nu + ii]! > x) {
            isMax = false;
            break;
          }
        }
      }
      if (isMax) found.push({ u: -1 + (2 * i) / (nu - 1), v: -1 + (2 * j) / (nv - 1), power: x });
    }
  }
  found.sort((a, b) => b.power - a.power);
  return found.slice(0, MAX_CANDIDATES);
}
