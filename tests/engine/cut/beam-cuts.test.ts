import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { beamCuts } from '../../../shared/engine/cut/beam-cuts.ts';
import { elementPhases } from '../../../shared/engine/phase/element-phases.ts';
import { findPeak } from '../../../shared/engine/search/find-peak.ts';
import { directionOf } from '../../../shared/engine/units/direction.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const LAMBDA_MM = 299.792458 / 10;
const cutsOf = (input: DesignInput) => {
  const d = DesignSchema.parse(input);
  const model = arrayModel(d, elementPhases(d).phaseRad);
  const peak = findPeak(model, directionOf((d.steerAzDeg * Math.PI) / 180, (d.steerElDeg * Math.PI) / 180));
  return beamCuts(model, peak);
};

describe('beamCuts(model, peak): the az and el cuts through the peak', () => {
  // Balanis, Antenna Theory (3rd ed.), §6.3, Table 6.2: HPBW ≈ 0.886·λ/(N·d) rad for a long uniform broadside array.
  it('a 64×8 λ/2 uniform array has HPBW 0.886·λ/(N·d) in each cut, with N = 64 in az and N = 8 in el (±1 % az, ±3 % el)', () => {
    const c = cutsOf({ frequencyGHz: 10, nx: 64, ny: 8, dxMm: LAMBDA_MM / 2 });
    const expected = (n: number) => (0.886 * 2 * 180) / (n * Math.PI);
    expect(Math.abs(c.az.hpbwDeg / expected(64) - 1)).toBeLessThanOrEqual(0.01);
    // 0.886/N is a large-N estimate; at N = 8 the exact width is 1.6 % wider.
    expect(Math.abs(c.el.hpbwDeg / expected(8) - 1)).toBeLessThanOrEqual(0.03);
    expect(c.az.clipped || c.el.clipped).toBe(false);
  });
  it('the el cut of a 1×8 λ/2 array has the −12.797 dB first side lobe of 8 uniform elements (±0.01 dB)', () => {
    // Maximum of (sin(8ψ/2)/(8 sin(ψ/2)))² between its first two nulls, found with SciPy 1.17.1
    // scipy.optimize.minimize_scalar (bounded): −12.797 dB at ψ = 1.1294 rad.
    const c = cutsOf({ frequencyGHz: 10, nx: 1, ny: 8, dxMm: LAMBDA_MM / 2 });
    expect(Math.abs(c.el.sllDb! - -12.797)).toBeLessThanOrEqual(0.01);
  });
});
