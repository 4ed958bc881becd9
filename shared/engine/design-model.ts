import type { Design } from '../schemas/design.ts';
import { arrayModel, type ArrayModel } from './array/array-model.ts';
import { RAD_PER_DEG } from './constants.ts';
import { elementPhases } from './phase/element-phases.ts';
import { findPeak, type Peak } from './search/find-peak.ts';
import { directionOf } from './units/direction.ts';

/** The excitation model of a design and its pattern peak, for the chart helpers. */
export function designModel(design: Design): { model: ArrayModel; peak: Peak } {
  const model = arrayModel(design, elementPhases(design).phaseRad);
  const intended = design.codes !== null ? directionOf(0, 0) : directionOf(design.steerAzDeg * RAD_PER_DEG, design.steerElDeg * RAD_PER_DEG);
  return { model, peak: findPeak(model, intended) };
}
