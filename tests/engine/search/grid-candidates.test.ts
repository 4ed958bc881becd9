import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { elementPhases } from '../../../shared/engine/phase/element-phases.ts';
import { gridCandidates } from '../../../shared/engine/search/grid-candidates.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const modelOf = (input: DesignInput) => {
  const d = DesignSchema.parse(input);
  return arrayModel(d, elementPhases(d).phaseRad);
};
const LAMBDA_MM = 299.792458 / 10;

describe('gridCandidates(model, nu, nv): lobes worth refining', () => {
  it('an 8×8 λ/2 array steered to (u, v) = (0.5, 0) offers its main lobe first, within one grid step of (0.5, 0)', () => {
    const c = gridCandidates(modelOf({ frequencyGHz: 10, nx: 8, ny: 8, dxMm: LAMBDA_MM / 2, steerAzDeg: 30 }), 65, 65);
    expect(Math.abs(c[0]!.u - 0.5)).toBeLessThanOrEqual(2 / 64);
    expect(Math.abs(c[0]!.v)).toBeLessThanOrEqual(2 / 64);
  });
  // At d = λ the lattice copies of the beam sit one 1/(d/λ) = 1 apart in u (Balanis §6.3.2, grating lobes):
  // steered to u = 0.4 the copy at u = −0.6 is visible and as strong, so both are candidates.
  it('a 6×1 array at d = λ steered to u = 0.4 offers the beam and its grating lobe at u = −0.6, both as strong', () => {
    const c = gridCandidates(modelOf({ frequencyGHz: 10, nx: 6, ny: 2, dxMm: LAMBDA_MM, dyMm: LAMBDA_MM / 2, steerAzDeg: (Math.asin(0.4) * 180) / Math.PI }), 201, 41);
    const us = c.slice(0, 2).map((x) => x.u).sort((a, b) => a - b);
    expect(Math.abs(us[0]! + 0.6)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(us[1]! - 0.4)).toBeLessThanOrEqual(0.01);
    expect(c[1]!.power / c[0]!.power).toBeGreaterThan(0.99);
  });
});
