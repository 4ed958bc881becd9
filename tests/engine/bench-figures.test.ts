import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';

// Common practice (no published source): bench figures for a small 28 GHz handset array, 4 columns at
// 5 mm pitch (λ ≈ 10.7 mm), 6-bit shifters. Modelled with a cosine element, q = 2; we accept 4° on
// widths and 5° on peaks, since the element pattern (not only the codes) pulls a wide beam to broadside.
const handset = (extra: Partial<DesignInput>) =>
  DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, element: { kind: 'cosine', q: 2 }, ...extra });

describe('bench figures (common practice) for the 28 GHz 4-column handset array, cosine q = 2', () => {
  it('at broadside the beam is about 24° wide (±4°)', () => {
    expect(Math.abs(evaluateDesign(handset({})).hpbwAzDeg - 24)).toBeLessThanOrEqual(4);
  });
  it('steered to 30° it uses codes 0, 15, 30, 45, peaks near 28° (±5°) and is about 30° wide (±4°)', () => {
    const m = evaluateDesign(handset({ steerAzDeg: 30 }));
    expect(m.codes).toEqual([0, 15, 30, 45]);
    expect(Math.abs(m.peakAzDeg - 28)).toBeLessThanOrEqual(5);
    expect(Math.abs(m.hpbwAzDeg - 30)).toBeLessThanOrEqual(4);
  });
  it('codes 0, 30, 60, 26 (naive doubling) peak near 50° (±5°), not 60°, about 30° wide (±4°), with a side lobe', () => {
    const m = evaluateDesign(handset({ codes: [0, 30, 60, 26] }));
    expect(Math.abs(m.peakAzDeg - 50)).toBeLessThanOrEqual(5);
    expect(Math.abs(m.hpbwAzDeg - 30)).toBeLessThanOrEqual(4);
    expect(m.sllAzDb).not.toBeNull();
    expect(m.sllAzDb!).toBeGreaterThan(-10);
  });
});
