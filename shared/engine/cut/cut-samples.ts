import { HALF_PI } from '../constants.ts';

/** Sample count for a -90°..90° cut with at most the given step; both ends included. */
export function cutSampleCount(stepRad: number): number {
  return Math.ceil(Math.PI / stepRad) + 1;
}

/** Angle in radians of sample i of a cut of `count` samples. */
export function cutAngle(i: number, count: number): number {
  return -HALF_PI + (Math.PI * i) / (count - 1);
}

/** Index of the last sample at or below the peak angle, clamped into the cut. */
export function peakSampleIndex(peakRad: number, count: number): number {
  const i = Math.floor(((peakRad + HALF_PI) / Math.PI) * (count - 1));
  return Math.max(0, Math.min(count - 1, i));
}
