import { describe, expect, it } from 'vitest';
import { evaluateDesign, patternCut, uvMap } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';

const design = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: 28, nx: 8, dxMm: 5.35, ...extra });
const codesOf = (m: ReturnType<typeof evaluateDesign>) => m.warnings.map((w) => w.code);

describe('edge cases', () => {
  it('N = 1 isotropic: 0 dBi, beam clipped at both horizons, no side lobes, no grating onsets', () => {
    const m = evaluateDesign(design({ nx: 1 }));
    expect(Math.abs(m.directivityDbi)).toBeLessThanOrEqual(1e-9);
    expect(m.hpbwAzDeg).toBeCloseTo(180, 9);
    expect(m.hpbwAzClipped && m.hpbwElClipped).toBe(true);
    expect(m.sllAzDb).toBeNull();
    expect(m.peakSllDb).toBeNull();
    expect(m.gratingLobeOnsetAzDeg).toBeNull();
    expect(m.gratingLobeOnsetElDeg).toBeNull();
    expect(m.channels).toBe(1);
  });
  it('N = 1 cosine q = 2 element: cos²θ is half power at 45°, so the HPBW is 90° (±0.1°)', () => {
    const m = evaluateDesign(design({ nx: 1, element: { kind: 'cosine', q: 2 } }));
    expect(Math.abs(m.hpbwAzDeg - 90)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(m.hpbwElDeg - 90)).toBeLessThanOrEqual(0.1);
    // ∮cos²θ over the front hemisphere is 2π/3, so D = 4π/(2π/3) = 6 (7.78 dBi).
    expect(Math.abs(m.directivityDbi - 10 * Math.log10(6))).toBeLessThanOrEqual(0.01);
  });
  it('an axis of one element has a null grating onset; the other axis keeps its own', () => {
    const m = evaluateDesign(design({ ny: 1, dxMm: 6.5 }));
    expect(m.gratingLobeOnsetElDeg).toBeNull();
    expect(m.gratingLobeOnsetAzDeg).not.toBeNull();
  });
  it('the steering limit ±90°: the beam lies on the horizon, clipped, and the peak is in front', () => {
    const m = evaluateDesign(design({ steerAzDeg: 90, dxMm: 4 }));
    expect(Math.abs(m.peakAzDeg - 90)).toBeLessThanOrEqual(0.1);
    expect(m.hpbwAzClipped).toBe(true);
    expect(codesOf(m)).toContain('beam-clipped');
    const n = evaluateDesign(design({ steerAzDeg: -90, dxMm: 4 }));
    expect(Math.abs(n.peakAzDeg + 90)).toBeLessThanOrEqual(0.1);
  });
  it('a linear array of isotropic elements peaks on its ridge at the point nearest the steer', () => {
    const m = evaluateDesign(design({ steerAzDeg: 20, steerElDeg: 35 }));
    expect(m.pointingErrorDeg!).toBeLessThanOrEqual(0.1);
  });
  it('codes whose progression exceeds 360·d/λ warn that the beam is beyond the visible region', () => {
    // 4 elements at 0.3 λ with a 180° step per element: u = 0.5/0.3 > 1.
    const m = evaluateDesign(design({ nx: 4, dxMm: 0.3 * (299.792458 / 28), phaseBits: 1, codes: [0, 1, 0, 1] }));
    expect(codesOf(m)).toContain('beam-beyond-visible');
    expect(codesOf(evaluateDesign(design({ nx: 4, phaseBits: 6, steerAzDeg: 30 })))).not.toContain('beam-beyond-visible');
  });
  it('equal twin beams of a 1-bit array: the one nearer the steer wins', () => {
    const m = evaluateDesign(design({ nx: 16, phaseBits: 1, steerAzDeg: 20, element: { kind: 'cosine', q: 1 } }));
    expect(m.peakAzDeg).toBeGreaterThan(0);
  });
  it('patternCut is 0 dB at the peak and never above it; uvMap is NaN outside the visible disk', () => {
    const d = design({ ny: 4, steerAzDeg: 25, element: { kind: 'tr38901' } });
    const cut = patternCut(d, 'az');
    expect(Math.max(...cut.powerDb)).toBeLessThanOrEqual(1e-9);
    expect(Math.max(...cut.powerDb)).toBeGreaterThan(-0.01);
    const map = uvMap(d, 41);
    expect(Number.isNaN(map.powerDb[0]!)).toBe(true);
    expect(Number.isNaN(map.powerDb[20 * 41 + 20]!)).toBe(false);
  });
  it('EIRP is conducted power + gain: uniform 8×2 isotropic at 10 dBm per channel is 10 + 20·log10(16) dBm, null without power', () => {
    // Common practice of array link budgets: EIRP = P_ch + 20·log10 N + G_e for a uniform array (G_e = 0 dBi here).
    const m = evaluateDesign(design({ ny: 2, channelPowerDbm: 10 }));
    expect(Math.abs(m.eirpDbm! - (10 + 20 * Math.log10(16)))).toBeLessThanOrEqual(0.1);
    expect(evaluateDesign(design({})).eirpDbm).toBeNull();
  });
  it('scan loss is zero at broadside and over 1 dB for an 8×8 cosine-element array scanned to 50°', () => {
    // Scan loss is the gain drop from broadside; the cos^1.5 element alone loses 15·log10(1/cos 50°) = 2.9 dB toward 50°.
    expect(Math.abs(evaluateDesign(design({ ny: 8, element: { kind: 'cosine', q: 1.5 } })).scanLossDb)).toBeLessThanOrEqual(1e-9);
    expect(evaluateDesign(design({ ny: 8, element: { kind: 'cosine', q: 1.5 }, steerAzDeg: 50 })).scanLossDb).toBeGreaterThan(1);
  });
});
