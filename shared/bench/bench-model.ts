/**
 * The engine's ArrayModel for a bench beam: the engine builds excitations from the taper and the
 * applied phases only, so per-channel gains (calibration, random errors, failed channels) are applied
 * here on top of it. Missing engine export: a model from explicit per-element complex weights.
 */
import type { Design } from '../schemas/design.ts';
import { arrayModel, type ArrayModel } from '../engine/array/array-model.ts';

/** Channel index of element (m, n) for the design's grouping; channels run from the -x/-y end, x fastest. */
export function channelOfElement(design: Design, m: number, n: number): number {
  return design.grouping === 'element' ? n * design.nx + m : design.grouping === 'column' ? m : n;
}

/**
 * Model of the design with the given applied phase per channel (radians) and amplitude factor per
 * channel (linear voltage, 1 = as the taper says; 0 = failed channel), optionally also per element
 * (x fastest; 0 = failed element).
 */
export function benchModel(
  design: Design,
  channelPhaseRad: ArrayLike<number>,
  channelAmplitude?: ArrayLike<number>,
  elementAmplitude?: ArrayLike<number>,
): ArrayModel {
  const { nx, ny } = design;
  const phaseRad = new Float64Array(nx * ny);
  for (let n = 0; n < ny; n++) for (let m = 0; m < nx; m++) phaseRad[n * nx + m] = channelPhaseRad[channelOfElement(design, m, n)]!;
  const model = arrayModel(design, phaseRad);
  let uniform = true;
  for (let c = 0; c < (channelAmplitude?.length ?? 0); c++) if (channelAmplitude![c] !== 1) uniform = false;
  for (let i = 0; i < (elementAmplitude?.length ?? 0); i++) if (elementAmplitude![i] !== 1) uniform = false;
  if (uniform) return model;
  const cRe = new Float64Array(model.cRe);
  const cIm = new Float64Array(model.cIm);
  for (let n = 0; n < ny; n++) {
    for (let m = 0; m < nx; m++) {
      const i = n * nx + m;
      const a = (channelAmplitude?.[channelOfElement(design, m, n)] ?? 1) * (elementAmplitude?.[i] ?? 1);
      cRe[i] = cRe[i]! * a;
      cIm[i] = cIm[i]! * a;
    }
  }
  // A line array stays separable (the other axis has a single weight 1); a 2-D one with per-channel
  // gains generally does not, so the engine's general sums are used.
  const line = nx === 1 || ny === 1;
  return {
    ...model,
    cRe,
    cIm,
    separable: line,
    xRe: ny === 1 ? cRe : new Float64Array([1]),
    xIm: ny === 1 ? cIm : new Float64Array([0]),
    yRe: ny === 1 ? new Float64Array([1]) : cRe,
    yIm: ny === 1 ? new Float64Array([0]) : cIm,
  };
}
