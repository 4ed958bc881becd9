import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { elementPhases } from '../../../shared/engine/phase/element-phases.ts';
import { ridgePeak } from '../../../shared/engine/search/ridge-peak.ts';
import { directionOf } from '../../../shared/engine/units/direction.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const modelOf = (input: DesignInput) => {
  const d = DesignSchema.parse(input);
  return arrayModel(d, elementPhases(d).phaseRad);
};
const DEG = Math.PI / 180;

describe('ridgePeak(model, intended, step): the beam cone of a line of flat elements', () => {
  // A linear array along x steered with progressive phase k·d·sin θ0 has its maximum on the cone u = sin θ0
  // (Balanis, Antenna Theory, 3rd ed., §6.3, scanning array).
  it('a 16-element line steered to 35° has its ridge at u = sin 35° (±1e-8, the golden search resolution on a flat top), at the point of the cone nearest the intended beam', () => {
    const intended = directionOf(35 * DEG, 0);
    const r = ridgePeak(modelOf({ frequencyGHz: 10, nx: 16, dxMm: 15, steerAzDeg: 35 }), intended, 0.01)!;
    expect(Math.abs(r.u - Math.sin(35 * DEG))).toBeLessThanOrEqual(1e-8);
    expect(r.v).toBeCloseTo(0, 12);
    expect(r.u ** 2 + r.v ** 2 + r.w ** 2).toBeCloseTo(1, 12);
  });
  it('a line along y ridges on v = sin(steer el)', () => {
    const intended = directionOf(0, -20 * DEG);
    const r = ridgePeak(modelOf({ frequencyGHz: 10, nx: 1, ny: 12, dxMm: 15, steerElDeg: -20 }), intended, 0.01)!;
    expect(Math.abs(r.v - Math.sin(-20 * DEG))).toBeLessThanOrEqual(1e-8);
  });
  it('is not used for planar arrays or shaped elements (null)', () => {
    const intended = directionOf(0, 0);
    expect(ridgePeak(modelOf({ frequencyGHz: 10, nx: 4, ny: 4, dxMm: 15 }), intended, 0.01)).toBeNull();
    expect(ridgePeak(modelOf({ frequencyGHz: 10, nx: 8, dxMm: 15, element: { kind: 'cosine', q: 1 } }), intended, 0.01)).toBeNull();
  });
});
