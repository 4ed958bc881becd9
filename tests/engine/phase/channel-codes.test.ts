import { describe, expect, it } from 'vitest';
import { channelCodes, evaluateDesign } from '../../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const handset = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, ...extra });

// Phase-code rule (README, "Conventions"): 4 columns at 5 mm, 28 GHz, 6 bits; +30° gives 0, 15, 30, 45 and
// -30° gives 0, 49, 34, 19 (round half up, non-negative mod).
describe('channelCodes(design) follows the channel phase-code rules', () => {
  it('steer +30° on the 4-column handset array gives codes 0, 15, 30, 45', () => {
    expect(channelCodes(handset({ steerAzDeg: 30 }))).toEqual([0, 15, 30, 45]);
  });
  it('steer -30° gives 0, 49, 34, 19 (never negative)', () => {
    expect(channelCodes(handset({ steerAzDeg: -30 }))).toEqual([0, 49, 34, 19]);
  });
  it('continuous phase has no codes', () => {
    expect(channelCodes(handset({ phaseBits: null }))).toBeNull();
    expect(evaluateDesign(handset({ phaseBits: null })).codes).toBeNull();
  });
  it('rounds exact halves up: Δx of half a step gives 0, 1, 1, 2 and at -90° gives 0, 0, 7, 7', () => {
    // λ = 1000 mm at 0.299792458 GHz; d = λ/16 at endfire makes Δx = 22.5° = half of a 3-bit step, exactly.
    const d = (steer: number) => DesignSchema.parse({ frequencyGHz: 0.299792458, nx: 4, dxMm: 62.5, phaseBits: 3, steerAzDeg: steer });
    expect(channelCodes(d(90))).toEqual([0, 1, 1, 2]);
    expect(channelCodes(d(-90))).toEqual([0, 0, 7, 7]);
  });
  it('element grouping lists channels with x fastest: index n·nx + m', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 3, ny: 2, dxMm: 5, phaseBits: 6, steerAzDeg: 30, steerElDeg: 20 });
    // Worked by hand: λ = 10.7069 mm; Δx = 360·(5/λ)·sin 30°·cos 20° = 78.99° = 14.042 steps of 5.625°,
    // Δy = 360·(5/λ)·sin 20° = 57.50° = 10.222 steps. Element (m, n) is m·14.042 + n·10.222 steps:
    // row 0: 0, 14.04, 28.08 → 0, 14, 28; row 1: 10.22, 24.26, 38.31 → 10, 24, 38.
    expect(channelCodes(d)).toEqual([0, 14, 28, 10, 24, 38]);
  });
  it('column grouping has one code per column; row grouping one per row', () => {
    expect(channelCodes(DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 3, dxMm: 5, phaseBits: 6, grouping: 'column', steerAzDeg: 30 }))).toEqual([0, 15, 30, 45]);
    expect(channelCodes(DesignSchema.parse({ frequencyGHz: 28, nx: 3, ny: 4, dxMm: 5, phaseBits: 6, grouping: 'row', steerElDeg: -30 }))).toEqual([0, 49, 34, 19]);
  });
  it('explicit codes override the steer and are reported as given', () => {
    const d = handset({ steerAzDeg: 30, codes: [0, 30, 60, 26] });
    expect(channelCodes(d)).toEqual([0, 30, 60, 26]);
    expect(evaluateDesign(d).pointingErrorDeg).toBeNull();
  });
  it('a positive code progression points the beam toward +az (applied phase -code·step)', () => {
    expect(evaluateDesign(handset({ codes: [0, 10, 20, 30] })).peakAzDeg).toBeGreaterThan(10);
    expect(evaluateDesign(handset({ codes: [0, 54, 44, 34] })).peakAzDeg).toBeLessThan(-10);
  });
});
