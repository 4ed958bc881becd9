import type { Element } from '../../schemas/design.ts';
import type { ArrayModel } from '../array/array-model.ts';
import { complexRadiatedPower } from './complex-radiated-power.ts';
import { pairKernel } from './pair-kernel.ts';
import { radiatedPower } from './radiated-power.ts';
import { tableKernel } from './table-kernel.ts';

/** Directivity 10·log10(4π·P_peak / ∮P dΩ), the integral over the whole sphere by element pairs. */
export function directivityDbi(model: ArrayModel, element: Element, peakPower: number): number {
  const total = element.kind === 'table'
    ? complexRadiatedPower(model, tableKernel(element.pattern!, model.nx, model.ny, model.kdx, model.kdy))
    : radiatedPower(model, pairKernel(element, model.nx, model.ny, model.kdx, model.kdy));
  return 10 * Math.log10((4 * Math.PI * peakPower) / total);
}
