import { goldenMax } from '../util/golden-max.ts';
import { cutAngle } from './cut-samples.ts';

/** Sampled side lobes within this ratio of the highest one are refined (sampling can underestimate a lobe). */
const REFINE_RATIO = 0.5;

/**
 * Highest local maximum outside the main lobe [left, right] (sample indices), in dB relative to the peak;
 * a cut end counts when the pattern rises toward it. Null when there is none.
 */
export function sideLobeLevelDb(
  f: (angleRad: number) => number,
  samples: Float64Array,
  count: number,
  left: number,
  right: number,
  peakPower: number,
): number | null {
  const maxima: number[] = [];
  for (let i = 0; i < count; i++) {
    if (i >= left && i <= right) continue;
    const s = samples[i]!;
    const risesFromLeft = i === 0 ? true : s > samples[i - 1]!;
    const notBelowRight = i === count - 1 ? true : s >= samples[i + 1]!;
    const isEnd = i === 0 || i === count - 1;
    // An end is a maximum only when the pattern rises toward it.
    if (isEnd && !((i === 0 && s > samples[1]!) || (i === count - 1 && s > samples[count - 2]!))) continue;
    if (risesFromLeft && notBelowRight) maxima.push(i);
  }
  if (maxima.length === 0) return null;
  let top = 0;
  for (const i of maxima) top = Math.max(top, samples[i]!);
  let best = 0;
  const tol = (Math.PI / (count - 1)) * 1e-4;
  for (const i of maxima) {
    if (samples[i]! < REFINE_RATIO * top) continue;
    if (i === 0 || i === count - 1) best = Math.max(best, samples[i]!);
    else best = Math.max(best, goldenMax(f, cutAngle(i - 1, count), cutAngle(i + 1, count), tol).value);
  }
  if (!(best > 0)) return null;
  return 10 * Math.log10(Math.min(best, peakPower) / peakPower);
}
