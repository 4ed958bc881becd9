import type { Design } from '../../schemas/design.ts';
import { RAD_PER_DEG } from '../constants.ts';
import { channelCodes, progressivePhaseDeg } from './channel-codes.ts';

/**
 * Applied phase per element in radians, x fastest (index n·nx + m), plus the codes that produced it.
 * Coded channel: -code·step; continuous: -(m·Δx + n·Δy).
 */
export function elementPhases(design: Design): { phaseRad: Float64Array; codes: number[] | null } {
  const { nx, ny } = design;
  const phaseRad = new Float64Array(nx * ny);
  const codes = channelCodes(design);
  if (codes === null) {
    const { dxDeg, dyDeg } = progressivePhaseDeg(design);
    for (let n = 0; n < ny; n++) for (let m = 0; m < nx; m++) phaseRad[n * nx + m] = -(m * dxDeg + n * dyDeg) * RAD_PER_DEG;
    return { phaseRad, codes };
  }
  const stepRad = (2 * Math.PI) / 2 ** (design.phaseBits ?? 0);
  for (let n = 0; n < ny; n++) {
    for (let m = 0; m < nx; m++) {
      const channel = design.grouping === 'element' ? n * nx + m : design.grouping === 'column' ? m : n;
      phaseRad[n * nx + m] = -codes[channel]! * stepRad;
    }
  }
  return { phaseRad, codes };
}
