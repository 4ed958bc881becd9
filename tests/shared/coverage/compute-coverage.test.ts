import { describe, expect, it } from 'vitest';
import { computeCoverage } from '../../../shared/coverage/index.ts';
import { coveredSolidAngleSr } from '../../../shared/coverage/covered-solid-angle.ts';
import { RF_EXPOSURE_CAUTION } from '../../../shared/safety/index.ts';
import { CoverageRequestSchema, type CoverageRequest } from '../../../shared/schemas/coverage.ts';

const LAMBDA_28_MM = 299.792458 / 28;
const run = (request: CoverageRequest) => computeCoverage(CoverageRequestSchema.parse(request));

/** One element, no steering: its "beam" is the element pattern itself. */
const single = (element: CoverageRequest['modules'][number]['design']['element'], channelPowerDbm = 10) => ({
  frequencyGHz: 28, nx: 1, ny: 1, dxMm: LAMBDA_28_MM / 2, element, channelPowerDbm,
});

describe('computeCoverage: closed forms', () => {
  it('an isotropic one-element module serves a sector at its peak everywhere, so min = peak = P + 0 dBi', () => {
    // Closed form: isotropic G = 1 (0 dBi) in every direction; conducted power of one full-amplitude channel = channelPowerDbm.
    const r = run({
      modules: [{ design: single({ kind: 'isotropic' }), orientation: 'front', beams: [{ azDeg: 0, elDeg: 0 }] }],
      region: { kind: 'sector', azMinDeg: -60, azMaxDeg: 45, elMinDeg: -20, elMaxDeg: 30 },
      percentiles: [5, 50, 95],
    });
    expect(r.peakEirpDbm).toBeCloseTo(10, 9);
    expect(r.minEirpDbm).toBeCloseTo(10, 9);
    for (const v of Object.values(r.eirpPercentilesDbm)) expect(v).toBeCloseTo(10, 9);
  });

  it('finds the dip midway between two beams at the depth the uniform-line array factor gives', () => {
    // Balanis, Antenna Theory §6.3: |AF(ψ)|² = [sin(Nψ/2)/(N·sin(ψ/2))]²·N², ψ = k·d·Δu. Beams at u = ±0.1 of an
    // 8-element λ/2 isotropic line (continuous phase) meet at u = 0, Δu = 0.1 from each: ψ = π/10, a dip of
    // 20·log10(N·sin(π/20)/sin(2π/5)) = 2.384 dB below the peak N (9.03 dBi). The 5° grid never samples u = 0
    // exactly, so this checks the dip search, not the grid.
    const N = 8;
    const design = { frequencyGHz: 28, nx: N, dxMm: LAMBDA_28_MM / 2, element: { kind: 'isotropic' as const }, channelPowerDbm: 0 };
    const azDeg = (Math.asin(0.1) * 180) / Math.PI;
    const r = run({
      modules: [{ design, orientation: 'front', beams: [{ azDeg: -azDeg, elDeg: 0 }, { azDeg, elDeg: 0 }] }],
      region: { kind: 'sector', azMinDeg: -4, azMaxDeg: 3, elMinDeg: -3, elMaxDeg: 2 },
      stepDeg: 5,
    });
    const dipDb = 20 * Math.log10((N * Math.sin(Math.PI / 20)) / Math.sin((2 * Math.PI) / 5));
    const peakDbm = 20 * Math.log10(N); // conducted 10·log10 8 dBm + gain 10·log10 8 dBi
    expect(Math.abs(r.minEirpDbm! - (peakDbm - dipDb))).toBeLessThan(0.01);
    expect(Math.abs(r.minAt.azDeg)).toBeLessThan(0.01);
  });

  it('reports progress as it samples, rising to 1', () => {
    const seen: number[] = [];
    const input = CoverageRequestSchema.parse({ modules: [{ design: single({ kind: 'isotropic' }), orientation: 'front', beams: [{ azDeg: 0, elDeg: 0 }] }], region: { kind: 'sphere' }, stepDeg: 5 });
    computeCoverage(input, (f) => seen.push(f));
    expect(seen.length).toBe(36 + 1); // one per 5° elevation row, then done
    expect(seen.every((f, i) => i === 0 || f >= seen[i - 1]!)).toBe(true);
    expect(seen[seen.length - 1]).toBe(1);
  });

  it('carries the model and RF-exposure cautions and an exposure estimate at the peak with every result', () => {
    const r = run({ modules: [{ design: single({ kind: 'isotropic' }, 30), orientation: 'front', beams: [{ azDeg: 0, elDeg: 0 }] }], region: { kind: 'sphere' }, stepDeg: 5 });
    expect(r.cautions).toContain(RF_EXPOSURE_CAUTION);
    expect(r.cautions.join(' ')).toMatch(/ignores the hand, the head and the device's own housing.*TR 38\.901 §7\.6\.4\.1.*compliance test measures the real device/);
    // S = EIRP/(4π r²): 30 dBm = 1 W at 1 m → 1/(4π) W/m² (far-field formula, as in shared/safety).
    expect(r.exposure!.densityWm2).toBeCloseTo(1 / (4 * Math.PI), 9);
  });

  it('modules facing opposite ways cover twice the solid angle of one (2π → 4π for a cos^q element)', () => {
    // By construction (common practice): a cos^q element radiates only into its front hemisphere (2π sr);
    // the back face's hemisphere is the complement, so two opposite faces light the whole sphere (4π sr).
    const design = single({ kind: 'cosine', q: 2 });
    const module = (orientation: 'front' | 'back' | 'right' | 'left') => ({ design, orientation, beams: [{ azDeg: 0, elDeg: 0 }] });
    const one = run({ modules: [module('front')], region: { kind: 'sphere' }, stepDeg: 2 });
    const two = run({ modules: [module('front'), module('back')], region: { kind: 'sphere' }, stepDeg: 2 });
    const side = run({ modules: [module('right'), module('left')], region: { kind: 'sphere' }, stepDeg: 2 });
    expect(coveredSolidAngleSr(one.map, -Infinity)).toBeCloseTo(2 * Math.PI, 9);
    expect(coveredSolidAngleSr(two.map, -Infinity)).toBeCloseTo(4 * Math.PI, 9);
    expect(coveredSolidAngleSr(side.map, -Infinity)).toBeCloseTo(4 * Math.PI, 9);
    // At any level the second face adds exactly the first face's share (mirror images on a symmetric grid).
    for (const level of [0, 10, 15]) expect(coveredSolidAngleSr(two.map, level)).toBeCloseTo(2 * coveredSolidAngleSr(one.map, level), 9);
    expect(one.minEirpDbm).toBeNull();
    expect(two.modules.map((m) => m.servedFraction)).toEqual([expect.closeTo(0.5, 9), expect.closeTo(0.5, 9)]);
  });

  it('a single broadside cos^q beam has the analytic solid-angle CDF (derivation below) within 0.25 dB', () => {
    // G(θ) = G0·cos^q θ in front (G0 = 2(q+1), Balanis, Antenna Theory §2.7, D = 2(n+1) for U = cos^n θ), 0 behind.
    // dΩ = 2π·d(cos θ), so the front solid angle with cos θ ≤ c is 2π·c. Over the sphere the dark back half adds
    // 2π: F(G ≤ G0·c^q) = (2π + 2πc)/4π = (1 + c)/2, so the p-th percentile is c = 2p/100 − 1,
    // EIRP_p = P + 10·log10(G0) + 10·q·log10(2p/100 − 1). Over the front hemisphere alone F = c, c = p/100.
    const q = 1.5;
    const p0 = 10;
    const g0Db = 10 * Math.log10(2 * (q + 1));
    const module = { design: single({ kind: 'cosine', q }, p0), orientation: 'front' as const, beams: [{ azDeg: 0, elDeg: 0 }] };
    const sphere = run({ modules: [module], region: { kind: 'sphere' }, percentiles: [25, 50, 60, 75, 90, 99] });
    expect(sphere.peakEirpDbm).toBeCloseTo(p0 + g0Db, 6);
    expect(sphere.eirpPercentilesDbm['25']).toBeNull();
    expect(sphere.eirpPercentilesDbm['50']).toBeNull();
    for (const p of [60, 75, 90, 99]) {
      const analytic = p0 + g0Db + 10 * q * Math.log10((2 * p) / 100 - 1);
      expect(Math.abs(sphere.eirpPercentilesDbm[String(p)]! - analytic)).toBeLessThan(0.25);
    }
    const front = run({ modules: [module], region: { kind: 'sector', azMinDeg: -90, azMaxDeg: 90, elMinDeg: -90, elMaxDeg: 90 }, percentiles: [10, 50, 90] });
    for (const p of [10, 50, 90]) {
      const analytic = p0 + g0Db + 10 * q * Math.log10(p / 100);
      expect(Math.abs(front.eirpPercentilesDbm[String(p)]! - analytic)).toBeLessThan(0.25);
    }
  });

  it('finds the peak of a beam steered between grid samples: 8 isotropic elements give P_cond + 10·log10 8', () => {
    // Closed form: continuous-phase uniform line, |AF|² peaks at (Σa)² = N² toward the steer; G = N²/N = N (9.03 dBi).
    // Conducted power: 8 channels at 0 dBm → 10·log10 8 dBm.
    const design = { frequencyGHz: 28, nx: 8, ny: 1, dxMm: LAMBDA_28_MM / 2, element: { kind: 'isotropic' as const }, channelPowerDbm: 0 };
    const r = run({ modules: [{ design, orientation: 'right', beams: [{ azDeg: 17.3, elDeg: 0 }] }], region: { kind: 'sphere' }, stepDeg: 5 });
    expect(Math.abs(r.peakEirpDbm! - 20 * Math.log10(8))).toBeLessThan(0.01);
    // The right face's beam at module az 17.3° points to device az 90° + 17.3° (worked as in module-frame.test.ts).
    expect(r.peakAt.azDeg).toBeCloseTo(107.3, 1);
    expect(r.peakAt.module).toBe(0);
  });
});
