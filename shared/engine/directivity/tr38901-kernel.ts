import { RAD_PER_DEG } from '../constants.ts';
import { tr38901PowerAt, TR38901_BEAMWIDTH_DEG, TR38901_FLOOR_DB } from '../element/tr38901.ts';
import { gaussLegendreOn } from '../util/gauss-legendre.ts';

/** Angular radius (rad) of the circle az² + el² = r² where the TR 38.901 pattern meets its 30 dB floor. */
const FLOOR_RADIUS_RAD = TR38901_BEAMWIDTH_DEG * Math.sqrt(TR38901_FLOOR_DB / 12) * RAD_PER_DEG;

/**
 * Pair kernel of the TR 38.901 element over the whole sphere, dΩ = cos(el)·d(el)·d(az):
 * G(a, b) = ∫∫ E·cos(a·kdx·u)·cos(b·kdy·v) dΩ (the sine parts vanish: E is even in az and el).
 * Gauss-Legendre in el, and in az on each side of the floor circle so every piece is smooth.
 */
export function tr38901Kernel(nx: number, ny: number, kdx: number, kdy: number): Float64Array {
  const alphaMax = (nx - 1) * kdx;
  const betaMax = (ny - 1) * kdy;
  const elRule = gaussLegendreOn(24 + Math.ceil(0.7 * betaMax), 0, Math.PI / 2);
  const g = new Float64Array(nx * ny);
  const ia = new Float64Array(nx);
  for (let e = 0; e < elRule.x.length; e++) {
    const el = elRule.x[e]!;
    const cosEl = Math.cos(el);
    const knee = Math.sqrt(FLOOR_RADIUS_RAD * FLOOR_RADIUS_RAD - el * el);
    ia.fill(0);
    const pieces: [number, number, number][] = [
      [0, knee, 24 + Math.ceil(0.9 * alphaMax * cosEl)],
      [knee, Math.PI, 16 + Math.ceil(0.7 * alphaMax * cosEl)],
    ];
    for (const [lo, hi, n] of pieces) {
      const r = gaussLegendreOn(n, lo, hi);
      for (let z = 0; z < n; z++) {
        const wE = 2 * r.w[z]! * tr38901PowerAt(r.x[z]!, el);
        const c1 = Math.cos(kdx * cosEl * Math.sin(r.x[z]!));
        // cos(a·θ) by the Chebyshev recurrence: one cosine per node for all a.
        let prev = 1;
        let cur = c1;
        ia[0] = ia[0]! + wE;
        for (let a = 1; a < nx; a++) {
          ia[a] = ia[a]! + wE * cur;
          const next = 2 * c1 * cur - prev;
          prev = cur;
          cur = next;
        }
      }
    }
    const we = 2 * elRule.w[e]! * cosEl;
    for (let b = 0; b < ny; b++) {
      const cb = we * Math.cos(b * kdy * Math.sin(el));
      for (let a = 0; a < nx; a++) g[a * ny + b] = g[a * ny + b]! + cb * ia[a]!;
    }
  }
  return g;
}
