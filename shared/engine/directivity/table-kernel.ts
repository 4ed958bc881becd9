import type { ElementPattern } from '../../schemas/element-pattern.ts';
import { tablePatternKey, tablePower } from '../element/table-pattern.ts';
import { gaussLegendreOn } from '../util/gauss-legendre.ts';
import { createMemo } from '../util/memo.ts';

/** Complex pair kernel over signed offsets: index (a + nx - 1)·(2ny - 1) + (b + ny - 1). */
export interface ComplexKernel {
  re: Float64Array;
  im: Float64Array;
}

const memo = createMemo<ComplexKernel>(16);

/** Gauss-Legendre nodes on each grid cell of [lo, hi] (cell edges every `step`), enough for `phasePerRad` of turning. */
function panelRule(lo: number, hi: number, step: number, phasePerRad: number): { x: number[]; w: number[] } {
  const x: number[] = [];
  const w: number[] = [];
  const cells = Math.max(1, Math.round((hi - lo) / step));
  const h = (hi - lo) / cells;
  const n = 3 + Math.ceil(0.6 * phasePerRad * h);
  for (let c = 0; c < cells; c++) {
    const r = gaussLegendreOn(n, lo + c * h, lo + (c + 1) * h);
    for (let i = 0; i < n; i++) {
      x.push(r.x[i]!);
      w.push(r.w[i]!);
    }
  }
  return { x, w };
}

/**
 * G(a, b) = ∮ E(az, el)·exp(j(a·kdx·u + b·kdy·v)) dΩ for a table element, dΩ = cos(el)·d(el)·d(az), by
 * Gauss-Legendre on every cell of the table's grid (E is bilinear, so smooth within a cell). A measured
 * pattern has no symmetry to lean on, so the kernel keeps its imaginary part and every signed offset.
 */
export function tableKernel(pattern: ElementPattern, nx: number, ny: number, kdx: number, kdy: number): ComplexKernel {
  return memo.get(`${tablePatternKey(pattern)}|${nx}|${ny}|${kdx}|${kdy}`, () => {
    const e = tablePower(pattern);
    const D = Math.PI / 180;
    const nAz = pattern.azDeg.length;
    const dAz = (pattern.azDeg[nAz - 1]! - pattern.azDeg[0]!) / (nAz - 1) * D;
    const dEl = (pattern.elDeg[pattern.elDeg.length - 1]! - pattern.elDeg[0]!) / (pattern.elDeg.length - 1) * D;
    const azLo = pattern.azDeg[0]! * D;
    // A table round the whole circle wraps; otherwise nothing radiates outside its azimuths.
    const azHi = Math.abs(nAz * dAz - 2 * Math.PI) < 1e-6 ? azLo + 2 * Math.PI : pattern.azDeg[nAz - 1]! * D;
    const az = panelRule(azLo, azHi, dAz, (nx - 1) * kdx + 1);
    const el = panelRule(-Math.PI / 2, Math.PI / 2, dEl, Math.max((ny - 1) * kdy, (nx - 1) * kdx) + 1);
    const w2 = 2 * ny - 1;
    const re = new Float64Array((2 * nx - 1) * w2);
    const im = new Float64Array((2 * nx - 1) * w2);
    const iaRe = new Float64Array(nx);
    const iaIm = new Float64Array(nx);
    for (let q = 0; q < el.x.length; q++) {
      const elq = el.x[q]!;
      const cosEl = Math.cos(elq);
      iaRe.fill(0);
      iaIm.fill(0);
      for (let p = 0; p < az.x.length; p++) {
        const wE = az.w[p]! * e(az.x[p]!, elq);
        if (wE === 0) continue;
        const th = kdx * cosEl * Math.sin(az.x[p]!);
        const zr = Math.cos(th);
        const zi = Math.sin(th);
        let cr = wE;
        let ci = 0;
        for (let a = 0; a < nx; a++) {
          iaRe[a] = iaRe[a]! + cr;
          iaIm[a] = iaIm[a]! + ci;
          const t = cr * zr - ci * zi;
          ci = cr * zi + ci * zr;
          cr = t;
        }
      }
      const we = el.w[q]! * cosEl;
      const sv = kdy * Math.sin(elq);
      for (let b = -(ny - 1); b < ny; b++) {
        const br = we * Math.cos(b * sv);
        const bi = we * Math.sin(b * sv);
        for (let a = 0; a < nx; a++) {
          // I(-a) = conj I(a): the az weights are real.
          const xr = iaRe[a]!;
          const xi = iaIm[a]!;
          const ip = (a + nx - 1) * w2 + b + ny - 1;
          re[ip] = re[ip]! + xr * br - xi * bi;
          im[ip] = im[ip]! + xr * bi + xi * br;
          if (a === 0) continue;
          const ineg = (nx - 1 - a) * w2 + b + ny - 1;
          re[ineg] = re[ineg]! + xr * br + xi * bi;
          im[ineg] = im[ineg]! + xr * bi - xi * br;
        }
      }
    }
    return { re, im };
  });
}
