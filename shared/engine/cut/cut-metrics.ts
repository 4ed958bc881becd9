import { DEG_PER_RAD } from '../constants.ts';

import { halfPowerEdge } from './half-power-edge.ts';
import { mainLobeEdge } from './main-lobe-edge.ts';
import { sideLobeLevelDb } from './side-lobe-level.ts';

export interface CutMetrics {
  hpbwDeg: number;
  clipped: boolean;
  sllDb: number | null;
}

/**
 * HPBW and side-lobe level of one -90°..90° cut f(angle) through the peak (peakRad, peakPower), given
 * f at `count` evenly spaced samples; half-power edges and side-lobe tops are refined on f itself.
 */
export function cutMetrics(f: (angleRad: number) => number, samples: Float64Array, count: number, peakRad: number, peakPower: number): CutMetrics {
  const lo = halfPowerEdge(f, samples, count, peakRad, peakPower, -1);
  const hi = halfPowerEdge(f, samples, count, peakRad, peakPower, 1);
  const left = mainLobeEdge(samples, count, peakRad, peakPower, -1);
  const right = mainLobeEdge(samples, count, peakRad, peakPower, 1);
  return {
    hpbwDeg: (hi.angleRad - lo.angleRad) * DEG_PER_RAD,
    clipped: lo.clipped || hi.clipped,
    sllDb: sideLobeLevelDb(f, samples, count, left, right, peakPower),
  };
}
