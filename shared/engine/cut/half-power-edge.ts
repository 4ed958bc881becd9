import { cutAngle, peakSampleIndex } from './cut-samples.ts';

const BISECTIONS = 30;

/**
 * Where the main beam first falls to half power, walking from the peak one way (dir = ±1) over the
 * samples; bisection on f between the bracketing samples. Returns the horizon and clipped = true when
 * the beam never falls that far.
 */
export function halfPowerEdge(
  f: (angleRad: number) => number,
  samples: Float64Array,
  count: number,
  peakRad: number,
  peakPower: number,
  dir: 1 | -1,
): { angleRad: number; clipped: boolean } {
  const half = 0.5 * peakPower;
  const first = peakSampleIndex(peakRad, count) + (dir > 0 ? 0 : 1);
  let inside = peakRad;
  for (let i = first; i >= 0 && i < count; i += dir) {
    const a = cutAngle(i, count);
    if ((a - peakRad) * dir <= 0) continue;
    if (samples[i]! < half) {
      let lo = inside;
      let hi = a;
      for (let k = 0; k < BISECTIONS; k++) {
        const mid = (lo + hi) / 2;
        if (f(mid) >= half) lo = mid;
        else hi = mid;
      }
      return { angleRad: (lo + hi) / 2, clipped: false };
    }
    inside = a;
  }
  return { angleRad: (dir * Math.PI) / 2, clipped: true };
}
