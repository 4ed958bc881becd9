import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { patternPower } from '../../../shared/engine/array/array-power.ts';
import { directivityDbi } from '../../../shared/engine/directivity/directivity-dbi.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const LAMBDA_MM = 299.792458 / 10;
const broadsideOf = (input: DesignInput) => {
  const d = DesignSchema.parse(input);
  const model = arrayModel(d, new Float64Array(d.nx * d.ny));
  return { d, model, value: directivityDbi(model, d.element, patternPower(model, 0, 0)) };
};

describe('directivityDbi(model, element, peakPower)', () => {
  // Balanis, Antenna Theory (3rd ed.), §2.7: a single cos^n θ element has D = 2(n+1).
  for (const q of [1, 1.5, 2]) {
    it(`one cos^${q} θ element has directivity 10·log10(2(${q}+1)) dBi (±0.001 dB)`, () => {
      expect(Math.abs(broadsideOf({ frequencyGHz: 10, nx: 1, dxMm: 10, element: { kind: 'cosine', q } }).value - 10 * Math.log10(2 * (q + 1)))).toBeLessThanOrEqual(0.001);
    });
  }
  // Balanis §6.4: N isotropic elements in a line at λ/2, broadside, have D = N (the pair terms vanish at kd = π).
  for (const [nx, ny] of [[30, 1], [1, 7]] as const) {
    it(`a ${nx}×${ny} half-wave line of isotropic elements has directivity 10·log10(${nx * ny}) dBi (±0.001 dB)`, () => {
      expect(Math.abs(broadsideOf({ frequencyGHz: 10, nx, ny, dxMm: LAMBDA_MM / 2 }).value - 10 * Math.log10(nx * ny))).toBeLessThanOrEqual(0.001);
    });
  }
});
