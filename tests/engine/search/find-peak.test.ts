import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { elementPhases } from '../../../shared/engine/phase/element-phases.ts';
import { findPeak } from '../../../shared/engine/search/find-peak.ts';
import { directionOf } from '../../../shared/engine/units/direction.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const DEG = Math.PI / 180;
const LAMBDA_MM = 299.792458 / 10;
const peakOf = (input: DesignInput, intended = directionOf(((input.steerAzDeg ?? 0) as number) * DEG, ((input.steerElDeg ?? 0) as number) * DEG)) => {
  const d = DesignSchema.parse(input);
  return findPeak(arrayModel(d, elementPhases(d).phaseRad), intended);
};

describe('findPeak(model, intended): the pattern maximum over the front hemisphere', () => {
  // With isotropic elements and continuous phase the maximum of |AF| is exactly at the steer (Balanis §6.3).
  it('a 12×10 isotropic array steered to (40°, 15°) peaks there (±1e-3°)', () => {
    const p = peakOf({ frequencyGHz: 10, nx: 12, ny: 10, dxMm: LAMBDA_MM / 2, steerAzDeg: 40, steerElDeg: 15 });
    expect(Math.abs(p.azRad / DEG - 40)).toBeLessThanOrEqual(1e-3);
    expect(Math.abs(p.elRad / DEG - 15)).toBeLessThanOrEqual(1e-3);
    expect(p.power).toBeCloseTo(120 ** 2, 6); // |Σ 1|² = N² at the steer
  });
  // A cos θ element multiplies the array factor by a slope that pulls the product's maximum toward broadside:
  // the peak of 4 elements steered to 45° sits short of 45° (common practice: element roll-off shifts small arrays' beams).
  it('a 4×1 array of cos θ elements steered to 45° peaks short of 45°', () => {
    const p = peakOf({ frequencyGHz: 10, nx: 4, dxMm: LAMBDA_MM / 2, steerAzDeg: 45, element: { kind: 'cosine', q: 1 } });
    expect(p.azRad / DEG).toBeLessThan(45);
    expect(p.azRad / DEG).toBeGreaterThan(30);
  });
  it('settles a tie of two equal grating lobes toward the intended direction', () => {
    // d = λ at broadside: lobes at u = 0 and u = ±1 (the horizon) are equal; the intended broadside wins.
    const p = peakOf({ frequencyGHz: 10, nx: 8, ny: 4, dxMm: LAMBDA_MM, dyMm: LAMBDA_MM / 2 });
    expect(Math.abs(p.azRad / DEG)).toBeLessThanOrEqual(1e-3);
    // Intended toward +90°: the horizon copy at u = +1 is as strong and now nearer, so it wins.
    const q = peakOf({ frequencyGHz: 10, nx: 8, ny: 4, dxMm: LAMBDA_MM, dyMm: LAMBDA_MM / 2 }, directionOf(80 * DEG, 0));
    expect(q.azRad / DEG).toBeGreaterThan(60);
  });
});
