import type { Design } from '../schemas/design.ts';
import { arrayPower } from './array/array-power.ts';
import { designModel } from './design-model.ts';

const FLOOR_DB = -200;

/**
 * Front-hemisphere pattern on a size×size u-v grid over [-1, 1]², in dB relative to the peak;
 * powerDb[j·size + i] is at (u[i], v[j]); NaN outside the visible disk.
 */
export function uvMap(design: Design, size: number): { u: Float64Array; v: Float64Array; powerDb: Float64Array; size: number } {
  if (!Number.isInteger(size) || size < 2 || size > 2048) throw new RangeError('invalid size');
  const { model, peak } = designModel(design);
  const u = new Float64Array(size);
  for (let i = 0; i < size; i++) u[i] = -1 + (2 * i) / (size - 1);
  const v = u.slice();
  const powerDb = new Float64Array(size * size);
  for (let j = 0; j < size; j++) {
    for (let i = 0; i < size; i++) {
      const w2 = 1 - u[i]! * u[i]! - v[j]! * v[j]!;
      if (w2 < 0) {
        powerDb[j * size + i] = NaN;
        continue;
      }
      const p = arrayPower(model, u[i]!, v[j]!) * model.element(Math.atan2(u[i]!, Math.sqrt(w2)), Math.asin(v[j]!));
      powerDb[j * size + i] = p > 0 ? Math.max(FLOOR_DB, 10 * Math.log10(p / peak.power)) : FLOOR_DB;
    }
  }
  return { u, v, powerDb, size };
}
