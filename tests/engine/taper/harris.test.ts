import { describe, expect, it } from 'vitest';
import { evaluateDesign, hamming, hann, taperEfficiencyDb } from '../../../shared/engine/index.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';
import fixture from '../../fixtures/engine/windows.json' with { type: 'json' };

const LAMBDA_MM = 299.792458 / 10;
// A λ/2 array at broadside: its array factor over u in [-1, 1] is exactly one period of the window's DTFT.
const broadside = (taper: 'hann' | 'hamming' | 'uniform', nx: number) =>
  DesignSchema.parse({ frequencyGHz: 10, nx, dxMm: LAMBDA_MM / 2, taperX: { kind: taper }, element: { kind: 'isotropic' } });

/** (Σw)² / (N·Σw²) in dB, straight from the weights. */
function efficiencyDbOf(w: readonly number[]): number {
  const sum = w.reduce((s, x) => s + x, 0);
  const sumSq = w.reduce((s, x) => s + x * x, 0);
  return 10 * Math.log10((sum * sum) / (w.length * sumSq));
}

// SciPy 1.17.1 reference: scipy.signal.windows.hann/hamming(N, sym=True) (and ones(N)), highest side lobe of the
// DTFT beyond the first null on a 2^22-point FFT, written by scripts/fixtures/gen_windows.py into
// tests/fixtures/engine/windows.json ("highestSideLobeDb").
describe('highest side lobe of tapered λ/2 arrays against SciPy-derived window spectra', () => {
  for (const taper of ['hann', 'hamming', 'uniform'] as const) {
    for (const [n, expected] of Object.entries(fixture.highestSideLobeDb[taper])) {
      it(`a ${n}-element ${taper} array has its highest side lobe at ${expected.toFixed(3)} dB (±0.02 dB)`, () => {
        const m = evaluateDesign(broadside(taper, Number(n)));
        expect(Math.abs(m.sllAzDb! - expected)).toBeLessThanOrEqual(0.02);
      });
    }
  }
});

// Harris, "On the use of windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66(1),
// 1978, Table I. It prints the highest side lobe in whole decibels, Hann −32 dB and Hamming −43 dB, for long
// windows; a whole-decibel entry can be checked only to about a decibel (the continuous Hann's −31.47 dB is
// printed as −32). It prints the equivalent noise bandwidth to 0.01 bin, Hann 1.50 and Hamming 1.36 bins;
// taper efficiency is 1/ENBW.
describe('Hann and Hamming tapers against Harris 1978, Table I', () => {
  it('a 64-element Hann array has its highest side lobe at Table I\'s −32 dB, to the table\'s whole-decibel resolution (±1 dB)', () => {
    expect(Math.abs(evaluateDesign(broadside('hann', 64)).sllAzDb! - -32)).toBeLessThanOrEqual(1);
  });
  it('a 64-element Hamming array has its highest side lobe at Table I\'s −43 dB, to the table\'s whole-decibel resolution (±1 dB)', () => {
    expect(Math.abs(evaluateDesign(broadside('hamming', 64)).sllAzDb! - -43)).toBeLessThanOrEqual(1);
  });
  // ±0.005 bin of rounding in the table is ±0.015 dB at 1.50 bins and ±0.016 dB at 1.36 bins.
  it('taper efficiency of a long Hann window is 1/1.50 bins in dB (±0.015 dB, the table\'s rounding)', () => {
    expect(Math.abs(taperEfficiencyDb(hann(4097)) - 10 * Math.log10(1 / 1.5))).toBeLessThanOrEqual(0.015);
  });
  it('taper efficiency of a long Hamming window is 1/1.36 bins in dB (±0.016 dB, the table\'s rounding)', () => {
    expect(Math.abs(taperEfficiencyDb(hamming(4097)) - 10 * Math.log10(1 / 1.36))).toBeLessThanOrEqual(0.016);
  });
});

// The two axes' efficiencies add in dB because the weights separate, w(m,n) = tx[m]·ty[n]; expected values from the
// SciPy 1.17.1 weights in the fixture (hann(16), hamming(9)), never from the engine's own taper code.
describe('evaluateDesign reports the taper efficiency of both axes', () => {
  it('a 16×9 Hann × Hamming array has (Σw)²/(N·Σw²) of the SciPy weights over all 144 elements (±1e-9 dB)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 10, nx: 16, ny: 9, dxMm: 15, taperX: { kind: 'hann' }, taperY: { kind: 'hamming' } });
    const wx = fixture.hann['16'];
    const wy = fixture.hamming['9'];
    const all = wx.flatMap((a) => wy.map((b) => a * b));
    expect(Math.abs(evaluateDesign(d).taperEfficiencyDb - efficiencyDbOf(all))).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(efficiencyDbOf(all) - (efficiencyDbOf(wx) + efficiencyDbOf(wy)))).toBeLessThanOrEqual(1e-9);
  });
});
