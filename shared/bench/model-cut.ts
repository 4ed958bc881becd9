import type { ArrayModel } from '../engine/array/array-model.ts';
import { patternPower } from '../engine/array/array-power.ts';
import { RAD_PER_DEG } from '../engine/constants.ts';

export type CutPlane = 'az' | 'el';

/** Floor for dB conversion: a null of the model is shown at -100 dB rather than -Infinity. */
const FLOOR = 1e-10;

/**
 * Model power in dB (relative to the cut's own maximum) at the given angles of an az cut (el = throughDeg)
 * or an el cut (az = throughDeg). Angles are wrapped into -180..180 so turntable angles 0..360 work.
 */
export function modelCutDb(model: ArrayModel, plane: CutPlane, throughDeg: number, anglesDeg: readonly number[]): number[] {
  const through = throughDeg * RAD_PER_DEG;
  const p = anglesDeg.map((a) => {
    const wrapped = ((((a + 180) % 360) + 360) % 360) - 180;
    const x = wrapped * RAD_PER_DEG;
    return plane === 'az' ? patternPower(model, x, through) : patternPower(model, through, x);
  });
  const peak = Math.max(...p);
  return p.map((x) => 10 * Math.log10(Math.max(x / peak, FLOOR)));
}
