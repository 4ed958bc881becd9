import { describe, expect, it } from 'vitest';
import { evaluateDesign, gratingLobeOnsetDeg, wavelengthMm } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';

const F_GHZ = 10;
const LAMBDA = wavelengthMm(F_GHZ);
const linear = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: F_GHZ, nx: 16, dxMm: LAMBDA / 2, ...extra });

// Balanis, Antenna Theory (3rd ed.), §6.4 (N-element linear array: directivity): a uniform broadside array of N
// isotropic elements at d = λ/2 has directivity N.
describe('Balanis: uniform linear arrays', () => {
  for (const n of [2, 5, 10, 32, 64]) {
    it(`directivity of ${n} isotropic elements at λ/2, broadside, is 10·log10(${n}) dBi (±0.01 dB)`, () => {
      const m = evaluateDesign(linear({ nx: n }));
      expect(Math.abs(m.directivityDbi - 10 * Math.log10(n))).toBeLessThanOrEqual(0.01);
    });
  }
  // The first side lobe of a uniform array tends to 20·log10(|sin x / x|) at its first maximum, tan x = x,
  // x = 4.4934: −13.26 dB, the exact large-N value (Balanis §6.3 derives it with an approximation that gives about
  // −13.46 dB; the exact root is used here). A 64-element array sits within 0.01 dB of the limit.
  it('the first side lobe of a 64-element uniform array is at -13.26 dB (±0.01 dB)', () => {
    expect(Math.abs(evaluateDesign(linear({ nx: 64 })).sllAzDb! + 13.2615)).toBeLessThanOrEqual(0.01);
  });
  // Balanis §6.3, Table 6.2: HPBW ≈ 0.886·λ/(N·d) rad for large N at broadside.
  it('HPBW of a 64-element uniform λ/2 array is 0.886·λ/(N·d) rad (±1 %)', () => {
    const expected = ((0.886 * LAMBDA) / (64 * (LAMBDA / 2))) * (180 / Math.PI);
    expect(Math.abs(evaluateDesign(linear({ nx: 64 })).hpbwAzDeg / expected - 1)).toBeLessThanOrEqual(0.01);
  });
  // Balanis §6.3 (scanned arrays): the beam broadens as 1/cos θ0 away from endfire.
  for (const steer of [20, 30, 45]) {
    it(`HPBW of a 64-element array scanned to ${steer}° grows as 1/cos θ0 (±2 %)`, () => {
      const broad = evaluateDesign(linear({ nx: 64 })).hpbwAzDeg;
      const scanned = evaluateDesign(linear({ nx: 64, steerAzDeg: steer })).hpbwAzDeg;
      expect(Math.abs((scanned * Math.cos((steer * Math.PI) / 180)) / broad - 1)).toBeLessThanOrEqual(0.02);
    });
  }
  // Balanis §6.3.2: grating lobes enter visible space when d/λ ≥ 1/(1 + |sin θ0|), so the onset steer is
  // θ0 = asin(λ/d − 1); the expected angles below are that formula evaluated by hand.
  it('gratingLobeOnsetDeg gives asin(λ/d − 1) (±0.01°)', () => {
    const expectedDeg: Array<[number, number]> = [[0.55, 54.903], [0.6, 41.810], [0.75, 19.471], [0.9, 6.379]];
    for (const [dl, deg] of expectedDeg) {
      expect(Math.abs(gratingLobeOnsetDeg(8, dl)! - deg)).toBeLessThanOrEqual(0.01);
    }
    expect(gratingLobeOnsetDeg(8, 0.5)).toBe(90);
    expect(gratingLobeOnsetDeg(8, 1.2)).toBe(0);
    expect(gratingLobeOnsetDeg(1, 0.9)).toBeNull();
  });
  it('a grating lobe is visible just past the onset angle and not just before it', () => {
    const dl = 0.6;
    const onset = Math.asin(1 / dl - 1) * (180 / Math.PI); // 41.81°
    const at = (steer: number) => evaluateDesign(linear({ dxMm: dl * LAMBDA, steerAzDeg: steer }));
    expect(at(onset - 0.5).gratingLobeVisible).toBe(false);
    expect(at(onset + 0.5).gratingLobeVisible).toBe(true);
    expect(at(onset + 0.5).warnings.map((w) => w.code)).toContain('grating-lobe-visible');
    expect(Math.abs(at(0).gratingLobeOnsetAzDeg! - onset)).toBeLessThanOrEqual(0.01);
  });
});
