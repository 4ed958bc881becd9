import { cutAngle, peakSampleIndex } from './cut-samples.ts';

/** Relative rise that counts as the pattern turning upward (guards against refinement round-off at the peak). */
const RISE_TOL = 1e-9;

/**
 * Sample index of the first local minimum walking from the peak one way (dir = ±1): the main lobe's
 * end on that side. Returns the last sample on that side when the pattern falls all the way to the end.
 */
export function mainLobeEdge(samples: Float64Array, count: number, peakRad: number, peakPower: number, dir: 1 | -1): number {
  let prev = peakPower;
  let prevIndex = -1;
  const start = peakSampleIndex(peakRad, count) + (dir > 0 ? 0 : 1);
  for (let i = start; i >= 0 && i < count; i += dir) {
    if ((cutAngle(i, count) - peakRad) * dir <= 0) continue;
    const s = samples[i]!;
    if (s > prev * (1 + RISE_TOL) && prevIndex >= 0) return prevIndex;
    prev = s;
    prevIndex = i;
  }
  return dir > 0 ? count - 1 : 0;
}
