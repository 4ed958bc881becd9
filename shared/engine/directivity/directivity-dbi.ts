import type { Element } from '../../schemas/design.ts';
import type { ArrayModel } from '../array/array-model.ts';
import { pairKernel } from './pair-kernel.ts';
import { radiatedPower } from './radiated-power.ts';

/** Directivity 10·log10(4π·P_peak / ∮P dΩ), the integral over the whole sphere by element pairs. */
export function directivityDbi(model: ArrayModel, element: Element, peakPower: number): number {
  const total = radiatedPower(model, pairKernel(element, model.nx, model.ny, model.kdx, model.kdy));
  return 10 * Math.log10((4 * Math.PI * peakPower) / total);
}
