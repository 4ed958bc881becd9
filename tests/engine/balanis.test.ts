import { describe, expect, it } from 'vitest';
import { evaluateDesign, gratingLobeOnsetDeg, wavelengthMm } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';

const F_GHZ = 10;
const LAMBDA = wavelengthMm(F_GHZ);
const linear = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: F_GHZ, nx: 16, dxMm: LAMBDA / 2, ...extra });

// Balanis, Antenna Theory (3rd ed.), §6.10: a uniform broadside array of N isotropic elements at
// d = λ/2 has directivity N.
describe('Balanis: uniform linear arrays', () => {
  for (const n of [2, 5, 10, 32, 64]) {
    it(`directivity of ${n} isotropic elements at λ/2, broadside, is 10·log10(${n}) dBi (±0.01 dB)`, () => {
      const m = evaluateDesign(linear({ nx: n }));
      expect(Math.abs(m.directivityDbi - 10 * Math.log10(n))).toBeLessThanOrEqual(0.01);
    });
  }
  // Balanis §6.3: the first side lobe of a uniform array tends to -13.26 dB as N grows.
  it('the first side lobe of a 64-element uniform array is at -13.26 dB (±0.05 dB)', () => {
    expect(Math.abs(evaluateDesign(linear({ nx: 64 })).sllAzDb! + 13.26)).toBeLessThanOrEqual(0.05);
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
  // Balanis §6.3.2: grating lobes enter visible space when d/λ ≥ 1/(1 + |sin θ0|).
  it('gratingLobeOnsetDeg solves d/λ = 1/(1 + sin θ0) (±0.01°)', () => {
    for (const dl of [0.55, 0.6, 0.75, 0.9]) {
      const onset = gratingLobeOnsetDeg(8, dl)!;
      expect(Math.abs(dl - 1 / (1 + Math.sin((onset * Math.PI) / 180)))).toBeLessThanOrEqual(1e-9);
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
