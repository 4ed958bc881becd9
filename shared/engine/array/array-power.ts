import type { ArrayModel } from './array-model.ts';
import { linePower } from './line-power.ts';

/** |AF(u, v)|², the array factor power at direction cosines (u, v); O(nx + ny) when separable. */
export function arrayPower(model: ArrayModel, u: number, v: number): number {
  const { nx, ny } = model;
  if (model.separable) {
    return linePower(model.xRe, model.xIm, nx, model.kdx, u) * linePower(model.yRe, model.yIm, ny, model.kdy, v);
  }
  const zxr = Math.cos(model.kdx * u);
  const zxi = Math.sin(model.kdx * u);
  const zyr = Math.cos(model.kdy * v);
  const zyi = Math.sin(model.kdy * v);
  const { cRe, cIm } = model;
  let tr = 0;
  let ti = 0;
  for (let n = ny - 1; n >= 0; n--) {
    const base = n * nx;
    let sr = cRe[base + nx - 1]!;
    let si = cIm[base + nx - 1]!;
    for (let m = nx - 2; m >= 0; m--) {
      const r = sr * zxr - si * zxi + cRe[base + m]!;
      si = sr * zxi + si * zxr + cIm[base + m]!;
      sr = r;
    }
    const r = tr * zyr - ti * zyi + sr;
    ti = tr * zyi + ti * zyr + si;
    tr = r;
  }
  return tr * tr + ti * ti;
}

/** Radiated power P(az, el) = |AF|²·E(az, el), angles in radians. */
export function patternPower(model: ArrayModel, azRad: number, elRad: number): number {
  const ce = Math.cos(elRad);
  return arrayPower(model, Math.sin(azRad) * ce, Math.sin(elRad)) * model.element(azRad, elRad);
}
