import { channelCount, type Design } from '../schemas/design.ts';
import { progressivePhaseDeg } from '../engine/phase/channel-codes.ts';
import { appliedPhaseRad, beamCodes, steeredDesign } from './beam-codes.ts';
import type { Beam } from './beam.ts';
import type { OffsetArrays } from './calibration.ts';

/**
 * Applied phase per channel (radians) for a beam: from its codes when the design has phase bits
 * (compensating calibration offsets), else the ideal continuous phase -(m·Δx + n·Δy).
 */
export function beamPhases(design: Design, beam: Beam, offsets?: OffsetArrays): { codes: number[] | null; phaseRad: Float64Array } {
  if (design.phaseBits !== null) {
    const codes = beamCodes(design, beam, offsets);
    return { codes, phaseRad: appliedPhaseRad(design, codes, offsets) };
  }
  const { dxDeg, dyDeg } = progressivePhaseDeg(steeredDesign(design, beam));
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const phaseRad = new Float64Array(channels);
  for (let c = 0; c < channels; c++) {
    const m = design.grouping === 'row' ? 0 : design.grouping === 'column' ? c : c % design.nx;
    const n = design.grouping === 'column' ? 0 : design.grouping === 'row' ? c : Math.floor(c / design.nx);
    phaseRad[c] = (-(m * dxDeg + n * dyDeg) * Math.PI) / 180;
  }
  return { codes: null, phaseRad };
}
