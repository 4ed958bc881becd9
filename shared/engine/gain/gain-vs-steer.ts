import type { Design } from '../../schemas/design.ts';
import { RAD_PER_DEG } from '../constants.ts';
import { elementPower } from '../element/element-power.ts';
import { elementGainDbi } from './element-gain-dbi.ts';
import { gainModel } from './gain-model.ts';

/**
 * Gain toward the steer as the design is steered along one axis (the other steer held), with the element's own
 * gain toward the same directions beneath it: how much of the scan loss is the element's roll-off. dBi; a null
 * (element behind, or no power) is -Infinity.
 */
export function gainVsSteer(design: Design, axis: 'az' | 'el', anglesDeg: readonly number[]): { anglesDeg: number[]; gainDbi: number[]; elementDbi: number[] } {
  const e = elementPower(design.element);
  const e0 = e(0, 0);
  const ge = elementGainDbi(design.element);
  const gainDbi: number[] = [];
  const elementDbi: number[] = [];
  for (const a of anglesDeg) {
    const steered = axis === 'az' ? { ...design, steerAzDeg: a, codes: null } : { ...design, steerElDeg: a, codes: null };
    const az = steered.steerAzDeg * RAD_PER_DEG;
    const el = steered.steerElDeg * RAD_PER_DEG;
    gainDbi.push(gainModel(steered).gainDbiAt(az, el));
    elementDbi.push(ge + 10 * Math.log10(e(az, el) / e0));
  }
  return { anglesDeg: [...anglesDeg], gainDbi, elementDbi };
}
