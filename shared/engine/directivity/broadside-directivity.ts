import type { Design } from '../../schemas/design.ts';
import { arrayModel } from '../array/array-model.ts';
import { patternPower } from '../array/array-power.ts';
import { createMemo } from '../util/memo.ts';
import { directivityDbi } from './directivity-dbi.ts';

const memo = createMemo<number>(256);

/**
 * Directivity of the design's array with all phases zero (the scan-loss reference). The peak is at
 * broadside: every element pattern here peaks there and |AF| ≤ Σw with equality at u = v = 0.
 * Memoised on everything but the steer.
 */
export function broadsideDirectivityDbi(design: Design): number {
  const key = JSON.stringify([design.frequencyGHz, design.nx, design.ny, design.dxMm, design.dyMm, design.taperX, design.taperY, design.element]);
  return memo.get(key, () => {
    const model = arrayModel(design, new Float64Array(design.nx * design.ny));
    return directivityDbi(model, design.element, patternPower(model, 0, 0));
  });
}
