import type { Design } from '../../schemas/design.ts';
import { arrayModel } from '../array/array-model.ts';
import { patternPower } from '../array/array-power.ts';
import { elementPhases } from '../phase/element-phases.ts';
import { conductedPowerDbm } from './conducted-power-dbm.ts';
import { elementGainDbi } from './element-gain-dbi.ts';
import { gainScale } from './gain-scale.ts';

/** Realised-gain view of one design at its steer (or its codes): what a link budget reads off the array. */
export interface GainModel {
  elementGainDbi: number;
  conductedPowerDbm: number | null;
  /** Linear power gain G(û) (a ratio, not dB); az in [-π, π] (|az| > π/2 is behind), el in [-π/2, π/2]. */
  gainAt(azRad: number, elRad: number): number;
  gainDbiAt(azRad: number, elRad: number): number;
}

/**
 * G(û) = G_e(û)·|AF(û)|²/Σa² with the design's applied (quantised) phases and amplitudes. Build once per beam
 * (set the steer on the design) and sample as often as needed: each sample is one array-factor sum.
 */
export function gainModel(design: Design): GainModel {
  const model = arrayModel(design, elementPhases(design).phaseRad);
  const ge = elementGainDbi(design.element);
  const { perPower } = gainScale(model, ge);
  const gainAt = (azRad: number, elRad: number): number => perPower * patternPower(model, azRad, elRad);
  return {
    elementGainDbi: ge,
    conductedPowerDbm: conductedPowerDbm(design),
    gainAt,
    gainDbiAt: (azRad, elRad) => 10 * Math.log10(gainAt(azRad, elRad)),
  };
}
