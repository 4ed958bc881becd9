import type { Design } from '../schemas/design.ts';
import { patternPower } from './array/array-power.ts';
import { DEG_PER_RAD, RAD_PER_DEG } from './constants.ts';
import { designModel } from './design-model.ts';

/** Floor for the chart in dB relative to the peak (exact nulls would be -∞). */
const FLOOR_DB = -200;

/**
 * A -90°..90° pattern cut for charts, in dB relative to the pattern peak. plane 'az' varies az at
 * el = throughDeg (default: the peak's el); 'el' varies el at az = throughDeg (default: the peak's az).
 */
export function patternCut(
  design: Design,
  plane: 'az' | 'el',
  options: { throughDeg?: number; stepDeg?: number } = {},
): { anglesDeg: Float64Array; powerDb: Float64Array } {
  const stepDeg = options.stepDeg ?? 0.25;
  if (!(stepDeg > 0 && stepDeg <= 90)) throw new RangeError('invalid stepDeg');
  const { model, peak } = designModel(design);
  const fixedRad = options.throughDeg !== undefined ? options.throughDeg * RAD_PER_DEG : plane === 'az' ? peak.elRad : peak.azRad;
  const count = Math.ceil(180 / stepDeg) + 1;
  const anglesDeg = new Float64Array(count);
  const powerDb = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const a = -90 + (180 * i) / (count - 1);
    const rad = a * RAD_PER_DEG;
    const p = plane === 'az' ? patternPower(model, rad, fixedRad) : patternPower(model, fixedRad, rad);
    anglesDeg[i] = a;
    powerDb[i] = p > 0 ? Math.max(FLOOR_DB, 10 * Math.log10(p / peak.power)) : FLOOR_DB;
  }
  return { anglesDeg, powerDb };
}

/** Peak direction in degrees, as the charts mark it. */
export function patternPeakDeg(design: Design): { azDeg: number; elDeg: number } {
  const { peak } = designModel(design);
  return { azDeg: peak.azRad * DEG_PER_RAD, elDeg: peak.elRad * DEG_PER_RAD };
}
