import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { cosineKernel } from '../../../shared/engine/directivity/cosine-kernel.ts';
import { radiatedPower } from '../../../shared/engine/directivity/radiated-power.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';
import { sphereIntegral } from './sphere-integral.ts';

const LAMBDA_MM = 299.792458 / 10;

describe('radiatedPower(model, kernel) = ∮ |AF|²·E dΩ', () => {
  it('a 3×2 tapered, irregularly phased array of cos θ elements matches a direct sphere integral of |AF|²·E (±3e-4 relative)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 3, ny: 2, dxMm: 0.6 * LAMBDA_MM, dyMm: 0.7 * LAMBDA_MM, taperX: { kind: 'hamming' }, element: { kind: 'cosine', q: 1 } });
    const phase = Float64Array.from([0.3, -1.1, 2.0, 0.7, 1.9, -0.4]); // not separable
    const model = arrayModel(d, phase);
    expect(model.separable).toBe(false);
    const kernel = cosineKernel(3, 2, model.kdx, model.kdy, 1);
    const direct = sphereIntegral((az, el) => {
      const w = Math.cos(az) * Math.cos(el);
      if (w <= 0) return 0;
      const u = Math.sin(az) * Math.cos(el);
      const v = Math.sin(el);
      let re = 0;
      let im = 0;
      for (let n = 0; n < 2; n++) for (let m = 0; m < 3; m++) {
        const i = n * 3 + m;
        const p = model.kdx * m * u + model.kdy * n * v;
        re += model.cRe[i]! * Math.cos(p) - model.cIm[i]! * Math.sin(p);
        im += model.cRe[i]! * Math.sin(p) + model.cIm[i]! * Math.cos(p);
      }
      return (re * re + im * im) * w;
    });
    expect(Math.abs(radiatedPower(model, kernel) / direct - 1)).toBeLessThanOrEqual(3e-4);
  });
  it('gives the same total through the separable and the general sums for a separable excitation (±1e-12 relative)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 5, ny: 3, dxMm: 0.55 * LAMBDA_MM, taperX: { kind: 'hann' }, steerAzDeg: 25, steerElDeg: 10 });
    const phase = new Float64Array(15);
    for (let n = 0; n < 3; n++) for (let m = 0; m < 5; m++) phase[n * 5 + m] = -(m * 0.9 + n * 0.4);
    const separable = arrayModel(d, phase);
    expect(separable.separable).toBe(true);
    const general = { ...separable, separable: false };
    const kernel = cosineKernel(5, 3, separable.kdx, separable.kdy, 0);
    expect(Math.abs(radiatedPower(separable, kernel) / radiatedPower(general, kernel) - 1)).toBeLessThanOrEqual(1e-12);
  });
});
