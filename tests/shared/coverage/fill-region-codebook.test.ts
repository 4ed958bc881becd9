import { describe, expect, it } from 'vitest';
import { computeCoverage, fillRegionCodebook } from '../../../shared/coverage/index.ts';
import { CoverageRequestSchema } from '../../../shared/schemas/coverage.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';

const LAMBDA_28_MM = 299.792458 / 28;
const N = 8;
/** Crossover (dB) midway between two beams of a uniform N-element line spaced s·λ/(N·d) apart in sine space. */
const midwayLossDb = (s: number) => -20 * Math.log10(Math.sin((Math.PI * s) / 2) / (N * Math.sin((Math.PI * s) / (2 * N))));

describe('fillRegionCodebook(design, region, crossoverDb)', () => {
  it('fills ±30° with an 8-element isotropic line at the spacing the array factor predicts for a 3 dB crossover', () => {
    // Balanis, Antenna Theory §6.3: uniform line |AF(ψ)| = |sin(Nψ/2)/(N·sin(ψ/2))|, ψ = k·d·Δu. Beams Δu apart
    // in u meet at Δu/2, ψ = π·s/N for spacing s·λ/(N·d): 0.9 → 3.07 dB (too deep), 0.8 → 2.38 dB (meets 3 dB).
    // Isotropic elements and continuous phase: no scan loss, so the crossover is the array factor's alone.
    // The region spans u = ±0.5: spacing 0.2 in u needs 5 beams (u = 0, ±0.2, ±0.4; the edges sit half a spacing out).
    const design = DesignSchema.parse({ frequencyGHz: 28, nx: N, dxMm: LAMBDA_28_MM / 2, element: { kind: 'isotropic' } });
    const r = fillRegionCodebook(design, { kind: 'sector', azMinDeg: -30, azMaxDeg: 30, elMinDeg: -2, elMaxDeg: 2 }, 3);
    expect(midwayLossDb(0.9)).toBeGreaterThan(3);
    expect(r.met).toBe(true);
    expect(r.spacing).toBe(0.8);
    expect(r.beams).toHaveLength(5);
    expect(Math.abs(r.crossoverDb! - midwayLossDb(0.8))).toBeLessThan(0.01);
    // u = 0.2 → az = asin(0.2) = 11.54°, u = 0.4 → 23.58° (worked by hand).
    expect(r.beams.map((b) => b.azDeg)).toEqual([-23.58, -11.54, 0, 11.54, 23.58]);
  });

  it('reports met = false and the crossover it reached when scan loss puts the target out of reach', () => {
    // A cos^1.5 element is 10·log10(cos^1.5 60°) = −4.5 dB at 60° before any array loss, so no beam at the
    // ±60° edge can be within 3 dB of the broadside beam's peak (Balanis §2.7 for the cos^n pattern).
    const design = DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 2, dxMm: LAMBDA_28_MM / 2, element: { kind: 'cosine', q: 1.5 } });
    const r = fillRegionCodebook(design, { kind: 'sector', azMinDeg: -60, azMaxDeg: 60, elMinDeg: -10, elMaxDeg: 10 }, 3);
    expect(r.met).toBe(false);
    expect(r.crossoverDb!).toBeGreaterThan(-15 * Math.log10(Math.cos(Math.PI / 3)));
    expect(r.targetCrossoverDb).toBe(3);
  });

  it('is what a module\'s {fill} codebook rule expands to inside computeCoverage, with the crossover reported', () => {
    // Same closed form as above (Balanis §6.3): spacing 0.8·λ/(N·d), 5 beams, 2.38 dB at the crossovers.
    const design = { frequencyGHz: 28, nx: N, dxMm: LAMBDA_28_MM / 2, element: { kind: 'isotropic' as const }, channelPowerDbm: 0 };
    const region = { kind: 'sector' as const, azMinDeg: -30, azMaxDeg: 30, elMinDeg: -2, elMaxDeg: 2 };
    const r = computeCoverage(CoverageRequestSchema.parse({ modules: [{ design, orientation: 'front', beams: { fill: { region, crossoverDb: 3 } } }], region, stepDeg: 1 }));
    expect(r.modules[0]!.beams).toBe(5);
    expect(r.modules[0]!.codebook.map((b) => b.azDeg)).toEqual([-23.58, -11.54, 0, 11.54, 23.58]);
    expect(r.modules[0]!.fill).toEqual(expect.objectContaining({ met: true, targetCrossoverDb: 3, spacing: 0.8 }));
    expect(Math.abs(r.modules[0]!.fill!.crossoverDb! - midwayLossDb(0.8))).toBeLessThan(0.01);
    // The device's own dip over the same region (front face = module frame) is the same crossover below its peak.
    expect(Math.abs(r.peakEirpDbm! - r.minEirpDbm! - midwayLossDb(0.8))).toBeLessThan(0.01);
  });
});
