import { describe, expect, it } from 'vitest';
import { cutAngle } from '../../../shared/engine/cut/cut-samples.ts';
import { mainLobeEdge } from '../../../shared/engine/cut/main-lobe-edge.ts';
import { sideLobeLevelDb } from '../../../shared/engine/cut/side-lobe-level.ts';
import fixture from '../../fixtures/engine/windows.json' with { type: 'json' };

const lineArray = (n: number) => (a: number) => {
  const psi = Math.PI * Math.sin(a); // d = λ/2: θ over ±90° covers one period of the DTFT
  return Math.abs(psi) < 1e-12 ? 1 : (Math.sin((n * psi) / 2) / (n * Math.sin(psi / 2))) ** 2;
};

describe('sideLobeLevelDb(f, samples, …) is the highest lobe outside the main lobe', () => {
  // SciPy 1.17.1 reference: highest side lobe of ones(16)'s DTFT (tests/fixtures/engine/windows.json).
  it(`a 16-element λ/2 uniform array on a coarse 1° cut reports ${fixture.highestSideLobeDb.uniform['16'].toFixed(3)} dB (±0.01 dB) after refinement`, () => {
    const f = lineArray(16);
    const count = 181;
    const s = Float64Array.from({ length: count }, (_, i) => f(cutAngle(i, count)));
    const left = mainLobeEdge(s, count, 0, 1, -1);
    const right = mainLobeEdge(s, count, 0, 1, 1);
    expect(Math.abs(sideLobeLevelDb(f, s, count, left, right, 1)! - fixture.highestSideLobeDb.uniform['16'])).toBeLessThanOrEqual(0.01);
  });
  it('a pattern with no lobe outside the main lobe has no side-lobe level', () => {
    const s = Float64Array.from({ length: 181 }, (_, i) => Math.cos(cutAngle(i, 181)) ** 2);
    expect(sideLobeLevelDb((a) => Math.cos(a) ** 2, s, 181, 0, 180, 1)).toBeNull();
  });
  it('a cut end counts as a lobe when the pattern rises toward it: 0.25 at the horizon is −6.02 dB (±0.01 dB)', () => {
    // Main lobe over the first half; then the pattern climbs to a quarter of the peak at +90°.
    const f = (a: number) => (a < 0 ? Math.cos(a) ** 2 : 0.25 * Math.sin(a) ** 2);
    const s = Float64Array.from({ length: 181 }, (_, i) => f(cutAngle(i, 181)));
    expect(Math.abs(sideLobeLevelDb(f, s, 181, 0, 90, 1)! - 10 * Math.log10(0.25))).toBeLessThanOrEqual(0.01);
  });
});
