import type { Design } from '../../schemas/design.ts';
import { elementFactors, elementIsFlat, elementKey, elementPower, type ElementPower } from '../element/element-power.ts';
import { elementAmplitudes } from '../gain/element-amplitudes.ts';
import { wavelengthMm } from '../units/wavelength-mm.ts';

/**
 * Complex element excitations of one design, ready for pattern sums. Element (m, n) has
 * weight c[n·nx + m] = tx[m]·ty[n]·exp(jφ_mn); when φ_mn = f(m) + g(n) (mod 2π) the array factor
 * factorises, AF(u, v) = AFx(u)·AFy(v), and the x/y factors are filled.
 */
export interface ArrayModel {
  nx: number;
  ny: number;
  /** k·dx and k·dy in radians: the phase step per unit of u (or v) between neighbours. */
  kdx: number;
  kdy: number;
  cRe: Float64Array;
  cIm: Float64Array;
  separable: boolean;
  xRe: Float64Array;
  xIm: Float64Array;
  yRe: Float64Array;
  yIm: Float64Array;
  element: ElementPower;
  /** E = az factor × el factor when the element separates (isotropic, cosine), else null. */
  elementFactors: { az: (rad: number) => number; el: (rad: number) => number } | null;
  elementKey: string;
  flatElement: boolean;
}

const SEPARABLE_TOL_RAD = 1e-9;

function wrapped(x: number): number {
  return Math.abs(x - 2 * Math.PI * Math.round(x / (2 * Math.PI)));
}

/** The model for a design and its applied phases (radians, x fastest). */
export function arrayModel(design: Design, phaseRad: Float64Array): ArrayModel {
  const { nx, ny } = design;
  const lambdaMm = wavelengthMm(design.frequencyGHz);
  // Taper amplitudes after any attenuator quantisation; tx, ty null when they no longer factorise.
  const { x: tx, y: ty, grid } = elementAmplitudes(design);
  const cRe = new Float64Array(nx * ny);
  const cIm = new Float64Array(nx * ny);
  let separable = tx !== null && ty !== null;
  const p00 = phaseRad[0]!;
  for (let n = 0; n < ny; n++) {
    for (let m = 0; m < nx; m++) {
      const i = n * nx + m;
      const p = phaseRad[i]!;
      const a = grid[i]!;
      cRe[i] = a * Math.cos(p);
      cIm[i] = a * Math.sin(p);
      if (separable && wrapped(p - phaseRad[m]! - phaseRad[n * nx]! + p00) > SEPARABLE_TOL_RAD) separable = false;
    }
  }
  const xRe = new Float64Array(nx);
  const xIm = new Float64Array(nx);
  const yRe = new Float64Array(ny);
  const yIm = new Float64Array(ny);
  if (separable && tx && ty) {
    for (let m = 0; m < nx; m++) {
      xRe[m] = tx[m]! * Math.cos(phaseRad[m]!);
      xIm[m] = tx[m]! * Math.sin(phaseRad[m]!);
    }
    for (let n = 0; n < ny; n++) {
      const p = phaseRad[n * nx]! - p00;
      yRe[n] = ty[n]! * Math.cos(p);
      yIm[n] = ty[n]! * Math.sin(p);
    }
  }
  return {
    nx,
    ny,
    kdx: (2 * Math.PI * design.dxMm) / lambdaMm,
    kdy: (2 * Math.PI * design.dyMm) / lambdaMm,
    cRe,
    cIm,
    separable,
    xRe,
    xIm,
    yRe,
    yIm,
    element: elementPower(design.element),
    elementFactors: elementFactors(design.element),
    elementKey: elementKey(design.element),
    flatElement: elementIsFlat(design.element),
  };
}
