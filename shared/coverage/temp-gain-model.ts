/**
 * TEMPORARY stand-in for the engine's gainModel / conductedPowerDbm until they land in shared/engine/gain;
 * same contract (G = G_e·|AF|²/Σa², P = channelPowerDbm + 10·log10 Σa_ch²). Deleted when the engine has them.
 */
import type { Design } from '../schemas/design.ts';
import { arrayModel } from '../engine/array/array-model.ts';
import { arrayPower } from '../engine/array/array-power.ts';
import { elementPhases } from '../engine/phase/element-phases.ts';
import { taperWeights } from '../engine/taper/taper-weights.ts';

export interface GainModel {
  elementGainDbi: number;
  conductedPowerDbm: number | null;
  gainAt(azRad: number, elRad: number): number;
  gainDbiAt(azRad: number, elRad: number): number;
}

function sumSquares(w: Float64Array): number {
  let s = 0;
  for (const x of w) s += x * x;
  return s;
}

export function conductedPowerDbm(design: Design): number | null {
  if (design.channelPowerDbm === null) return null;
  const tx = sumSquares(taperWeights(design.taperX, design.nx));
  const ty = sumSquares(taperWeights(design.taperY, design.ny));
  const s = design.grouping === 'element' ? tx * ty : design.grouping === 'column' ? tx : ty;
  return design.channelPowerDbm + 10 * Math.log10(s);
}

export function gainModel(design: Design): GainModel {
  const model = arrayModel(design, elementPhases(design).phaseRad);
  const e = design.element;
  const ge = e.kind === 'cosine' ? 2 * (e.q + 1) : 1;
  const norm = ge / (sumSquares(taperWeights(design.taperX, design.nx)) * sumSquares(taperWeights(design.taperY, design.ny)));
  const gainAt = (az: number, el: number): number => {
    const ce = Math.cos(el);
    return norm * arrayPower(model, Math.sin(az) * ce, Math.sin(el)) * model.element(az, el);
  };
  return {
    elementGainDbi: 10 * Math.log10(e.kind === 'tr38901' ? 10 ** 0.8 : ge),
    conductedPowerDbm: conductedPowerDbm(design),
    gainAt,
    gainDbiAt: (az, el) => 10 * Math.log10(gainAt(az, el)),
  };
}
