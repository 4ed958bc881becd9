import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { patternPower } from '../../../shared/engine/array/array-power.ts';
import { broadsideDirectivityDbi } from '../../../shared/engine/directivity/broadside-directivity.ts';
import { directivityDbi } from '../../../shared/engine/directivity/directivity-dbi.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const LAMBDA_MM = 299.792458 / 10;
const zeroPhaseDirectivityDbi = (input: DesignInput) => {
  const d = DesignSchema.parse(input);
  const model = arrayModel(d, new Float64Array(d.nx * d.ny));
  return directivityDbi(model, d.element, patternPower(model, 0, 0));
};

describe('broadsideDirectivityDbi(design): the scan-loss reference', () => {
  it('equals the directivity of the same array with every phase zero, whatever the design\'s steer (±1e-12 dB)', () => {
    const input: DesignInput = { frequencyGHz: 10, nx: 4, ny: 3, dxMm: 0.6 * LAMBDA_MM, taperX: { kind: 'hamming' }, element: { kind: 'cosine', q: 1.5 } };
    const steered = DesignSchema.parse({ ...input, steerAzDeg: 40, steerElDeg: 10 });
    expect(Math.abs(broadsideDirectivityDbi(steered) - zeroPhaseDirectivityDbi(input))).toBeLessThanOrEqual(1e-12);
  });
});


// Balanis, Antenna Theory (3rd ed.), §6.4: a λ/2 line of N isotropic elements has D = N at broadside, so a
// steered design's reference is 10·log10(N) whatever its steer.
describe('broadsideDirectivityDbi(design) of a half-wave line', () => {
  it('is 10·log10(16) dBi for 16 isotropic elements steered to 50° (±0.001 dB)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 16, dxMm: LAMBDA_MM / 2, steerAzDeg: 50 });
    expect(Math.abs(broadsideDirectivityDbi(d) - 10 * Math.log10(16))).toBeLessThanOrEqual(0.001);
  });
});
