/**
 * The reference handset of `bench coverage` and the coverage convergence test (invented): three 28 GHz modules
 * of 4 × 2 cos^1.5 elements at half-wave pitch, 5-bit phase, 4 dBm per channel, on the back, left and right
 * faces, each with the same 8-beam codebook (az −45..45 step 30 × el −15, 15 in the module's frame).
 */
import type { CoverageRequest } from '../shared/schemas/coverage.ts';

const LAMBDA_28_MM = 299.792458 / 28;

export function referenceHandset(extra: Partial<CoverageRequest> = {}): CoverageRequest {
  const design = {
    frequencyGHz: 28, nx: 4, ny: 2, dxMm: LAMBDA_28_MM / 2, phaseBits: 5,
    element: { kind: 'cosine' as const, q: 1.5 }, channelPowerDbm: 4,
  };
  const beams = { grid: 'az -45:45:30 × el -15:15:30' };
  return {
    modules: [
      { design, orientation: 'back', beams },
      { design, orientation: 'left', beams },
      { design, orientation: 'right', beams },
    ],
    region: { kind: 'sphere' },
    percentiles: [5, 10, 50, 90],
    ...extra,
  };
}
