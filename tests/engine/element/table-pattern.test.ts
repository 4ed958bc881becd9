import { describe, expect, it } from 'vitest';
import { evaluateDesign, tablePatternDbiAt, wavelengthMm } from '../../../shared/engine/index.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';
import type { ElementPattern } from '../../../shared/schemas/element-pattern.ts';

const D2R = Math.PI / 180;
const LAMBDA = wavelengthMm(28);

/** A table sampled from cos^q θ with gain 2(q + 1) (Balanis, cos^n θ directivity), -60 dBi where the cosine is 0. */
function cosineTable(q: number, stepDeg: number, azFrom: number, azTo: number): ElementPattern {
  const azDeg: number[] = [];
  const elDeg: number[] = [];
  for (let a = azFrom; a <= azTo + 1e-9; a += stepDeg) azDeg.push(a);
  for (let e = -90; e <= 90 + 1e-9; e += stepDeg) elDeg.push(e);
  const gainDbi: number[] = [];
  for (const e of elDeg) for (const a of azDeg) {
    const c = Math.cos(a * D2R) * Math.cos(e * D2R);
    gainDbi.push(c > 1e-6 ? 10 * Math.log10(2 * (q + 1) * c ** q) : -60);
  }
  return { azDeg, elDeg, gainDbi };
}

describe('table element: bilinear az/el interpolation and numerical directivity', () => {
  it('interpolates linear power bilinearly between grid points (hand value on a 2 × 2 cell)', () => {
    const p: ElementPattern = { azDeg: [-90, 90], elDeg: [-90, 90], gainDbi: [0, 10, 0, 10] };
    // Midway in az between 1 and 10 (linear): 5.5 → 7.404 dBi.
    expect(Math.abs(tablePatternDbiAt(p, 0, 0) - 10 * Math.log10(5.5))).toBeLessThanOrEqual(1e-9);
  });
  // The cosine element's own closed-form kernel (checked against Balanis elsewhere) is the reference here.
  for (const [label, table] of [['whole sphere, 2° grid', cosineTable(1.5, 2, -180, 180)], ['front hemisphere only, 5° grid', cosineTable(1.5, 5, -90, 90)]] as const) {
    it(`a cos^1.5 table (${label}) gives the cosine element's directivity and gain for 8×4 at (30°, 10°) (±0.1 dB)`, () => {
      const base = { frequencyGHz: 28, nx: 8, ny: 4, dxMm: LAMBDA / 2, steerAzDeg: 30, steerElDeg: 10, taperX: { kind: 'hamming' } } as const;
      const cos = evaluateDesign(DesignSchema.parse({ ...base, element: { kind: 'cosine', q: 1.5 } }));
      const tab = evaluateDesign(DesignSchema.parse({ ...base, element: { kind: 'table', patternId: 'demo', pattern: table } }));
      expect(Math.abs(tab.elementGainDbi - 10 * Math.log10(5))).toBeLessThanOrEqual(0.1);
      expect(Math.abs(tab.directivityDbi - cos.directivityDbi)).toBeLessThanOrEqual(0.1);
      expect(Math.abs(tab.gainDbi - cos.gainDbi)).toBeLessThanOrEqual(0.1);
      expect(Math.abs(tab.gainAtSteerDbi! - cos.gainAtSteerDbi!)).toBeLessThanOrEqual(0.1);
      expect(Math.abs(tab.peakAzDeg - cos.peakAzDeg)).toBeLessThanOrEqual(0.1);
    });
  }
  it('a lone element of a tilted (asymmetric) table: directivity from the sphere integral of the table itself (±0.1 dB)', () => {
    // cos^2 of the angle from a beam tilted 20° in az, front only: D = 4π / ∮ cos²; a midpoint sum does the integral.
    const azDeg: number[] = [];
    const elDeg: number[] = [];
    for (let a = -180; a < 180; a += 1) azDeg.push(a);
    for (let e = -90; e <= 90; e += 1) elDeg.push(e);
    const lin = (a: number, e: number) => Math.max(Math.cos((a - 20) * D2R) * Math.cos(e * D2R), 0) ** 2 + 1e-4;
    const gainDbi: number[] = [];
    for (const e of elDeg) for (const a of azDeg) gainDbi.push(10 * Math.log10(lin(a, e)));
    let total = 0;
    const n = 720;
    for (let j = 0; j < n / 2; j++) for (let i = 0; i < n; i++) {
      const e = -90 + (180 * (j + 0.5)) / (n / 2);
      const a = -180 + (360 * (i + 0.5)) / n;
      total += lin(a, e) * Math.cos(e * D2R) * (Math.PI / (n / 2)) * ((2 * Math.PI) / n);
    }
    const m = evaluateDesign(DesignSchema.parse({ frequencyGHz: 28, nx: 1, dxMm: 5, element: { kind: 'table', patternId: 'tilt', pattern: { azDeg, elDeg, gainDbi } } }));
    expect(Math.abs(m.peakAzDeg - 20)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(m.directivityDbi - 10 * Math.log10((4 * Math.PI * (1 + 1e-4)) / total))).toBeLessThanOrEqual(0.1);
  });
  it('an unresolved table element is refused by the engine with a RangeError naming element.pattern', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, element: { kind: 'table', patternId: 'x' } });
    expect(() => evaluateDesign(d)).toThrow(/element\.pattern/);
  });
});
