import { channelCount, type Design } from '../schemas/design.ts';
import { progressivePhaseDeg } from '../engine/phase/channel-codes.ts';
import { BenchInputError } from './bench-input-error.ts';
import type { Beam } from './beam.ts';
import type { OffsetArrays } from './calibration.ts';

/** The design steered to a beam, with explicit codes dropped; grouping limits are checked (field names the beam). */
export function steeredDesign(design: Design, beam: Beam, field = 'beam'): Design {
  if (design.grouping === 'column' && beam.elDeg !== 0) throw new BenchInputError(`${field}.elDeg`, 'must be 0 with column grouping (columns steer in azimuth only)');
  if (design.grouping === 'row' && beam.azDeg !== 0) throw new BenchInputError(`${field}.azDeg`, 'must be 0 with row grouping (rows steer in elevation only)');
  return { ...design, steerAzDeg: beam.azDeg, steerElDeg: beam.elDeg, codes: null };
}

/**
 * Phase codes of every channel for a beam, as the engine contract defines them:
 * code = round((m·Δx + n·Δy + φc)/step) mod 2^B, halves up, never negative, where φc is the channel's
 * measured phase offset (0 without calibration): the channel adds φc itself, so the code asks for that much
 * more delay and the applied total -code·step + φc lands on the ideal -(m·Δx + n·Δy).
 */
export function beamCodes(design: Design, beam: Beam, offsets?: OffsetArrays, field = 'beam'): number[] {
  if (design.phaseBits === null) throw new BenchInputError('phaseBits', 'must be set (bench codes need phase-shifter bits)');
  const steered = steeredDesign(design, beam, field);
  const levels = 2 ** design.phaseBits;
  const step = 360 / levels;
  const { dxDeg, dyDeg } = progressivePhaseDeg(steered);
  const channels = channelCount(design.grouping, design.nx, design.ny);
  const out: number[] = [];
  for (let c = 0; c < channels; c++) {
    const m = design.grouping === 'row' ? 0 : design.grouping === 'column' ? c : c % design.nx;
    const n = design.grouping === 'column' ? 0 : design.grouping === 'row' ? c : Math.floor(c / design.nx);
    const ideal = m * dxDeg + n * dyDeg + (offsets?.phaseDeg[c] ?? 0);
    const code = Math.floor(ideal / step + 0.5) % levels;
    out.push(code < 0 ? code + levels : code);
  }
  return out;
}

/** Applied phase per channel in radians for codes on a channel that adds its own offset: -code·step + φc. */
export function appliedPhaseRad(design: Design, codes: readonly number[], offsets?: OffsetArrays): Float64Array {
  const stepRad = (2 * Math.PI) / 2 ** (design.phaseBits ?? 0);
  return Float64Array.from(codes, (code, c) => -code * stepRad + ((offsets?.phaseDeg[c] ?? 0) * Math.PI) / 180);
}

/** Linear amplitude factor per channel from gain offsets in dB. */
export function channelAmplitude(offsets: OffsetArrays | undefined, channels: number): Float64Array {
  return Float64Array.from({ length: channels }, (_, c) => 10 ** ((offsets?.gainDb[c] ?? 0) / 20));
}
