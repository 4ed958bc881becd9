/**
 * The fixed 28 GHz benchmark grid: 3 × 2 × 4 × 4 × 4 designs × 13 steering angles = 4,992 points.
 * Pitches are fractions of the wavelength (dyMm omitted, so dy = dx).
 */
import { SPEED_OF_LIGHT_M_S } from '../engine/constants.ts';
import type { SweepGridInput } from './grid-schema.ts';

const FREQUENCY_GHZ = 28;
const LAMBDA_MM = (SPEED_OF_LIGHT_M_S / (FREQUENCY_GHZ * 1e9)) * 1e3;

export const BENCH_GRID: SweepGridInput = {
  frequencyGHz: FREQUENCY_GHZ,
  nx: [4, 8, 16],
  ny: [1, 4],
  dxMm: [0.45, 0.5, 0.55, 0.6].map((f) => f * LAMBDA_MM),
  taperX: [{ kind: 'uniform' }, { kind: 'taylor', sllDb: 25, nbar: 4 }, { kind: 'chebyshev', sllDb: 30 }, { kind: 'hamming' }],
  taperY: { kind: 'uniform' },
  phaseBits: [null, 3, 4, 6],
  grouping: 'element',
  element: { kind: 'cosine', q: 1.5 },
  steerAzDeg: Array.from({ length: 13 }, (_, i) => i * 5),
  steerElDeg: 0,
};
export const BENCH_POINTS = 4992;
