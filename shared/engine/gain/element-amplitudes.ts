import type { Design } from '../../schemas/design.ts';
import { taperWeights } from '../taper/taper-weights.ts';
import { attenuatedAmplitude, attenuatorCode } from './attenuator-code.ts';

/**
 * Peak-normalised amplitude of every element after attenuator quantisation (when the design has an attenuator).
 * `x`, `y`: amplitude = x[m]·y[n] when it factorises (always without an attenuator), else null and `grid`
 * (index n·nx + m) holds each element. The attenuator sits on the channel: per element, per column (x) or per row (y).
 */
export interface ElementAmplitudes {
  x: Float64Array | null;
  y: Float64Array | null;
  grid: Float64Array;
}

function quantised(w: Float64Array, stepDb: number, bits: number): Float64Array {
  const out = new Float64Array(w.length);
  for (let i = 0; i < w.length; i++) out[i] = attenuatedAmplitude(attenuatorCode(w[i]!, stepDb, bits), stepDb);
  return out;
}

export function elementAmplitudes(design: Design): ElementAmplitudes {
  const { nx, ny } = design;
  let x = taperWeights(design.taperX, nx);
  let y = taperWeights(design.taperY, ny);
  const step = design.attenuatorStepDb;
  const bits = design.attenuatorBits;
  const grid = new Float64Array(nx * ny);
  if (step === undefined || bits === undefined || design.grouping !== 'element') {
    if (step !== undefined && bits !== undefined) {
      if (design.grouping === 'column') x = quantised(x, step, bits);
      else y = quantised(y, step, bits);
    }
    for (let n = 0; n < ny; n++) for (let m = 0; m < nx; m++) grid[n * nx + m] = x[m]! * y[n]!;
    return { x, y, grid };
  }
  // One attenuator per element: quantising the product need not factorise; check against the axes' own codes.
  const qx = quantised(x, step, bits);
  const qy = quantised(y, step, bits);
  let separable = true;
  for (let n = 0; n < ny; n++) {
    for (let m = 0; m < nx; m++) {
      const a = attenuatedAmplitude(attenuatorCode(x[m]! * y[n]!, step, bits), step);
      grid[n * nx + m] = a;
      if (separable && Math.abs(a - qx[m]! * qy[n]!) > 1e-12) separable = false;
    }
  }
  return separable ? { x: qx, y: qy, grid } : { x: null, y: null, grid };
}
