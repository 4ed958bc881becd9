import type { Design } from '../../schemas/design.ts';
import { taperWeights } from '../taper/taper-weights.ts';
import { attenuatedAmplitude, attenuatorCode } from './attenuator-code.ts';

/** The taper amplitude each channel asks for, before quantisation, in phase-code channel order. */
function wanted(design: Design): Float64Array {
  const { nx, ny } = design;
  const tx = taperWeights(design.taperX, nx);
  const ty = taperWeights(design.taperY, ny);
  if (design.grouping === 'column') return Float64Array.from(tx);
  if (design.grouping === 'row') return Float64Array.from(ty);
  const out = new Float64Array(nx * ny);
  for (let n = 0; n < ny; n++) for (let m = 0; m < nx; m++) out[n * nx + m] = tx[m]! * ty[n]!;
  return out;
}

/** Attenuator code per channel (same order as the phase codes), or null when the design has no attenuator. */
export function attenuatorCodes(design: Design): number[] | null {
  const step = design.attenuatorStepDb;
  const bits = design.attenuatorBits;
  if (step === undefined || bits === undefined) return null;
  return Array.from(wanted(design), (a) => attenuatorCode(a, step, bits));
}

/**
 * One peak-normalised amplitude per RF channel (element grouping tx·ty, column tx[m], row ty[n]; x fastest),
 * after attenuator quantisation when the design has an attenuator.
 */
export function channelAmplitudes(design: Design): Float64Array {
  const a = wanted(design);
  const codes = attenuatorCodes(design);
  if (codes === null) return a;
  const step = design.attenuatorStepDb!;
  for (let i = 0; i < a.length; i++) a[i] = attenuatedAmplitude(codes[i]!, step);
  return a;
}
