import { describe, expect, it } from 'vitest';
import { evaluateDesign, hamming, hann, taperEfficiencyDb } from '../../../shared/engine/index.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';

// Harris, "On the use of windows for harmonic analysis with the discrete Fourier transform",
// Proc. IEEE 66(1), 1978, Table I: highest side lobe Hann -31.5 dB, Hamming -42.7 dB (or better);
// equivalent noise bandwidth Hann 1.50 bins, Hamming 1.36 bins. Taper efficiency = 1/ENBW.
const broadside = (taper: 'hann' | 'hamming') =>
  DesignSchema.parse({ frequencyGHz: 10, nx: 64, dxMm: 14.99, taperX: { kind: taper }, element: { kind: 'isotropic' } });

describe('Hann and Hamming tapers against Harris 1978', () => {
  it('a long Hann-tapered array has its highest side lobe at -31.5 dB (±0.5 dB)', () => {
    const m = evaluateDesign(broadside('hann'));
    expect(Math.abs(m.sllAzDb! - -31.5)).toBeLessThanOrEqual(0.5);
  });
  it('a long Hamming-tapered array has side lobes at -42.7 dB or better (0.3 dB allowance)', () => {
    const m = evaluateDesign(broadside('hamming'));
    expect(m.sllAzDb!).toBeLessThanOrEqual(-42.7 + 0.3);
    expect(m.sllAzDb!).toBeGreaterThan(-46);
  });
  it('taper efficiency of a long Hann window is 1/1.50 in dB (±0.01 dB)', () => {
    expect(Math.abs(taperEfficiencyDb(hann(4097)) - 10 * Math.log10(1 / 1.5))).toBeLessThanOrEqual(0.01);
  });
  it('taper efficiency of a long Hamming window is 1/1.36 in dB (±0.02 dB: Harris rounds to 0.01 bin)', () => {
    expect(Math.abs(taperEfficiencyDb(hamming(4097)) - 10 * Math.log10(1 / 1.36))).toBeLessThanOrEqual(0.02);
  });
  it('evaluateDesign reports the taper efficiency of both axes together (sum of the axes in dB, ±1e-9)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 16, ny: 9, dxMm: 15, taperX: { kind: 'hann' }, taperY: { kind: 'hamming' } });
    const expected = taperEfficiencyDb(hann(16)) + taperEfficiencyDb(hamming(9));
    expect(Math.abs(evaluateDesign(d).taperEfficiencyDb - expected)).toBeLessThanOrEqual(1e-9);
    // Over all 144 elements directly: (Σw)²/(N·Σw²).
    const wx = hann(16);
    const wy = hamming(9);
    const px = Math.max(...wx);
    const py = Math.max(...wy);
    let s = 0;
    let s2 = 0;
    for (const a of wx) for (const b of wy) {
      s += (a / px) * (b / py);
      s2 += ((a / px) * (b / py)) ** 2;
    }
    expect(Math.abs(evaluateDesign(d).taperEfficiencyDb - 10 * Math.log10((s * s) / (144 * s2)))).toBeLessThanOrEqual(0.01);
  });
});
