import { DEG_PER_RAD } from '../engine/constants.ts';
import { wavelengthMm } from '../engine/units/wavelength-mm.ts';
import type { Design } from '../schemas/design.ts';

/** Sampling steps the automatic choice picks from (degrees), coarsest first. */
const NICE_STEPS_DEG = [2, 1.5, 1, 0.75, 0.5, 0.25];
/** Samples across the narrowest half-power beamwidth; 6 kept the percentiles within 0.1 dB of a 0.25° grid in the convergence test. */
const SAMPLES_PER_BEAMWIDTH = 6;

/**
 * The grid step for a set of module designs: a sixth of the narrowest broadside half-power beamwidth
 * (uniform-line estimate 0.886·λ/(N·d), Balanis §6.3, the narrowest any taper gives), snapped to a
 * nice step from 2° down to 0.25°.
 */
export function autoStepDeg(designs: readonly Pick<Design, 'frequencyGHz' | 'nx' | 'ny' | 'dxMm' | 'dyMm'>[]): number {
  let hpbwDeg = Infinity;
  for (const d of designs) {
    const lambdaMm = wavelengthMm(d.frequencyGHz);
    if (d.nx > 1) hpbwDeg = Math.min(hpbwDeg, (0.886 * lambdaMm * DEG_PER_RAD) / (d.nx * d.dxMm));
    if (d.ny > 1) hpbwDeg = Math.min(hpbwDeg, (0.886 * lambdaMm * DEG_PER_RAD) / (d.ny * d.dyMm));
  }
  const wanted = hpbwDeg / SAMPLES_PER_BEAMWIDTH;
  return NICE_STEPS_DEG.find((s) => s <= wanted) ?? NICE_STEPS_DEG[NICE_STEPS_DEG.length - 1]!;
}
