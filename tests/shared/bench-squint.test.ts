import { describe, expect, it } from 'vitest';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { BANDS } from '../../shared/targets/bands.ts';
import { beamSquint } from '../../shared/bench/beam-squint.ts';

const n257 = BANDS.find((b) => b.id === 'n257')!;

describe('beamSquint(design, beam, band)', () => {
  it('uses n257 as 26.5–29.5 GHz (3GPP TS 38.101-2 Table 5.2-1, recalled from memory)', () => {
    expect([n257.lowGHz, n257.highGHz]).toEqual([26.5, 29.5]);
  });

  it('moves a phase-steered beam as sin θ(f) = (f0/f)·sin θ0 (Mailloux, Phased Array Antenna Handbook, bandwidth of phase steering; from memory), within 0.05°', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 16, dxMm: 5.35, phaseBits: null });
    const r = beamSquint(d, { azDeg: 45, elDeg: 0 }, { lowGHz: n257.lowGHz, highGHz: n257.highGHz, points: 13 });
    for (const p of r.points) {
      const expected = (Math.asin((28 / p.frequencyGHz) * Math.sin(Math.PI / 4)) * 180) / Math.PI;
      expect(Math.abs(p.peakAzDeg - expected)).toBeLessThan(0.05);
    }
    // The low band edge moves furthest: sin θ grows as 1/f.
    expect(r.worstSquintAtGHz).toBe(26.5);
    expect(r.worstSquintDeg).toBeCloseTo((Math.asin((28 / 26.5) * Math.SQRT1_2) * 180) / Math.PI - 45, 1);
    // Gain toward the intended direction is highest at the design frequency (within the 0.25 GHz grid).
    const best = r.points.reduce((a, b) => (b.gainTowardDbi > a.gainTowardDbi ? b : a));
    expect(Math.abs(best.frequencyGHz - 28)).toBeLessThanOrEqual(0.25);
    expect(r.worstGainDropDb).toBeGreaterThan(0.5);
  });

  it('does not squint a broadside beam (all phases equal)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 8, ny: 8, dxMm: 5.35, phaseBits: 6, element: { kind: 'tr38901' } });
    const r = beamSquint(d, { azDeg: 0, elDeg: 0 }, { lowGHz: 26.5, highGHz: 29.5, points: 5 });
    expect(r.worstSquintDeg).toBeLessThan(0.01);
    expect(r.codes).toEqual(new Array(64).fill(0));
  });

  it('squints more for a wider scan (sin θ0 scales the movement)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 8, dxMm: 5.35, phaseBits: 6, grouping: 'column' });
    const band = { lowGHz: 26.5, highGHz: 29.5, points: 7 };
    expect(beamSquint(d, { azDeg: 50, elDeg: 0 }, band).worstSquintDeg).toBeGreaterThan(beamSquint(d, { azDeg: 15, elDeg: 0 }, band).worstSquintDeg);
  });
});
