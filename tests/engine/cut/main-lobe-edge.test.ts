import { describe, expect, it } from 'vitest';
import { cutAngle } from '../../../shared/engine/cut/cut-samples.ts';
import { mainLobeEdge } from '../../../shared/engine/cut/main-lobe-edge.ts';

// Uniform N-element array at pitch d: |AF|² = (sin(Nψ/2)/(N sin(ψ/2)))², ψ = kd·sin θ; its first nulls are at
// sin θ = ±λ/(N·d) (Balanis, Antenna Theory, 3rd ed., §6.3, nulls of the uniform linear array).
const N = 8;
const af2 = (a: number) => {
  const psi = Math.PI * Math.sin(a); // d = λ/2
  return Math.abs(psi) < 1e-12 ? 1 : (Math.sin((N * psi) / 2) / (N * Math.sin(psi / 2))) ** 2;
};
const COUNT = 1801; // 0.1° samples
const samples = Float64Array.from({ length: COUNT }, (_, i) => af2(cutAngle(i, COUNT)));
const nullDeg = (Math.asin(2 / N) * 180) / Math.PI; // 14.4775°

describe('mainLobeEdge(samples, …) ends the main lobe at the first minimum', () => {
  it(`an 8-element λ/2 uniform array's main lobe ends at its first null, asin(λ/(N·d)) = ${nullDeg.toFixed(3)}° (within one 0.1° sample)`, () => {
    const right = mainLobeEdge(samples, COUNT, 0, 1, 1);
    const left = mainLobeEdge(samples, COUNT, 0, 1, -1);
    expect(Math.abs((cutAngle(right, COUNT) * 180) / Math.PI - nullDeg)).toBeLessThanOrEqual(0.1);
    expect(Math.abs((cutAngle(left, COUNT) * 180) / Math.PI + nullDeg)).toBeLessThanOrEqual(0.1);
  });
  it('a pattern that falls all the way to the horizon has its main lobe end at the last sample', () => {
    const cos = Float64Array.from({ length: 181 }, (_, i) => Math.cos(cutAngle(i, 181)) ** 2);
    expect(mainLobeEdge(cos, 181, 0, 1, 1)).toBe(180);
    expect(mainLobeEdge(cos, 181, 0, 1, -1)).toBe(0);
  });
});
