import { describe, expect, it } from 'vitest';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { distribution, quantileSorted } from '../../shared/bench/distribution.ts';
import { monteCarlo } from '../../shared/bench/monte-carlo.ts';
import { MonteCarloOptionsSchema } from '../../shared/bench/monte-carlo-schema.ts';
import { idealBeam, monteCarloTrials } from '../../shared/bench/monte-carlo-trials.ts';
import { gaussian, mulberry32 } from '../../shared/bench/random.ts';

const LAMBDA_MM = (299792458 / 28e9) * 1e3;
// A λ/2 line of isotropic elements radiates Σ|w|² exactly (sin(kr)/kr vanishes at every other element),
// so its directivity is the array gain the classical error theory describes.
const line = DesignSchema.parse({ frequencyGHz: 28, nx: 64, dxMm: LAMBDA_MM / 2, phaseBits: null });

describe('mulberry32 and gaussian', () => {
  it('repeat for a seed and give standard normal moments (mean 0, variance 1 within 0.02 over 200 000 draws)', () => {
    const a = gaussian(mulberry32(42));
    const b = gaussian(mulberry32(42));
    const xs = Array.from({ length: 200_000 }, () => a());
    expect(b()).toBe(xs[0]);
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length;
    expect(Math.abs(mean)).toBeLessThan(0.02);
    expect(Math.abs(variance - 1)).toBeLessThan(0.02);
  });
});

describe('quantileSorted and distribution', () => {
  it('follows R-7 (the d3-array quantile test values: 7.25, 9, 14.5)', () => {
    const xs = [3, 6, 7, 8, 8, 10, 13, 15, 16, 20];
    expect(quantileSorted(xs, 0.25)).toBe(7.25);
    expect(quantileSorted(xs, 0.5)).toBe(9);
    expect(quantileSorted(xs, 0.75)).toBe(14.5);
  });
  it('counts every finite value once in the histogram', () => {
    const d = distribution([1, 2, 2, 3, NaN, 9, Infinity]);
    expect(d.count).toBe(5);
    expect(d.histogram.counts.reduce((s, c) => s + c, 0)).toBe(5);
    expect(d.min).toBe(1);
    expect(d.max).toBe(9);
  });
});

describe('monteCarlo(design, options)', () => {
  it('is reproducible for a seed, differs for another, and any split of the trials gives the same numbers', () => {
    const opts = { trials: 40, seed: 11, phaseSigmaDeg: 12, amplitudeSigmaDb: 0.8, failedElements: 2 };
    const a = monteCarlo(line, opts);
    const b = monteCarlo(line, opts);
    expect(b).toEqual(a);
    expect(monteCarlo(line, { ...opts, seed: 12 }).directivityLossDb.mean).not.toBe(a.directivityLossDb.mean);
    const parsed = MonteCarloOptionsSchema.parse(opts);
    const ideal = idealBeam(line, parsed);
    const whole = monteCarloTrials(line, parsed, ideal, 0, 40);
    const split = [...monteCarloTrials(line, parsed, ideal, 0, 13), ...monteCarloTrials(line, parsed, ideal, 13, 27)];
    expect(split).toEqual(whole);
  });

  it('loses nothing without errors', () => {
    const r = monteCarlo(line, { trials: 5, seed: 1 });
    expect(r.directivityLossDb.max).toBeLessThan(1e-6);
    expect(r.pointingErrorDeg.max).toBeLessThan(1e-3);
  });

  it.each([10, 20, 30])(
    'has a mean directivity ratio near exp(-σφ²) for σφ = %d° phase errors alone (Ruze, Proc. IEEE 54, 1966; Mailloux, Phased Array Antenna Handbook), within 0.01',
    (sigmaDeg) => {
      const r = monteCarlo(line, { trials: 1000, seed: 2024, phaseSigmaDeg: sigmaDeg });
      const sigma = (sigmaDeg * Math.PI) / 180;
      expect(r.phaseOnlyEstimateRatio).toBeCloseTo(Math.exp(-sigma * sigma), 12);
      // The classical form drops the 1/N incoherent term, (1 - e^{-σ²})/N, which is below 0.004 here.
      expect(Math.abs(r.meanDirectivityRatio - Math.exp(-sigma * sigma))).toBeLessThan(0.01);
    },
  );

  it('loses 10·log10(N/(N-K)) dB with K failed elements of a uniform λ/2 line (directivity ∝ surviving elements), within 0.05 dB', () => {
    const r = monteCarlo(line, { trials: 30, seed: 5, failedElements: 8 });
    expect(Math.abs(r.directivityLossDb.mean - 10 * Math.log10(64 / 56))).toBeLessThan(0.05);
    expect(r.phaseOnlyEstimateRatio).toBeNull();
  });

  it('raises the side lobes of a Taylor-tapered beam as the phase errors grow', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 16, dxMm: LAMBDA_MM / 2, taperX: { kind: 'taylor', sllDb: 30, nbar: 4 }, phaseBits: null });
    const small = monteCarlo(d, { trials: 60, seed: 3, phaseSigmaDeg: 3 });
    const large = monteCarlo(d, { trials: 60, seed: 3, phaseSigmaDeg: 20 });
    expect(small.ideal.sllDb!).toBeLessThan(-29);
    expect(large.sllDb.percentiles.find((p) => p.p === 50)!.value).toBeGreaterThan(small.sllDb.percentiles.find((p) => p.p === 50)!.value + 3);
  });

  it('refuses as many failures as elements, naming the field', () => {
    expect(() => monteCarlo(line, { trials: 1, failedElements: 64 })).toThrow('failedElements');
  });
});
