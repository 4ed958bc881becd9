import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { analyseCut } from '../../shared/bench/analyse-cut.ts';
import { analyseMeasurement } from '../../shared/bench/analyse-measurement.ts';
import { appliedPhaseRad, beamCodes } from '../../shared/bench/beam-codes.ts';
import { benchModel } from '../../shared/bench/bench-model.ts';
import { modelCutDb } from '../../shared/bench/model-cut.ts';
import { overlayCuts } from '../../shared/bench/overlay-cuts.ts';
import { parseRangeCsv } from '../../shared/bench/parse-range-csv.ts';
import { gaussian, mulberry32 } from '../../shared/bench/random.ts';

const design = DesignSchema.parse({ frequencyGHz: 28, nx: 8, ny: 4, dxMm: 5.35, phaseBits: 6, element: { kind: 'cosine', q: 1.5 } });

/** A measurement file as a turntable would write it: the model cut, shifted, plus seeded Gaussian noise in dB. */
function measuredFile(beam: { azDeg: number; elDeg: number }, options: { noiseDb: number; seed: number; shiftDeg?: number; stepDeg?: number; offsetDbm?: number }): string {
  const codes = beamCodes(design, beam);
  const model = benchModel(design, appliedPhaseRad(design, codes));
  const step = options.stepDeg ?? 0.5;
  const angles = Array.from({ length: Math.round(180 / step) + 1 }, (_, i) => -90 + i * step);
  const db = modelCutDb(model, 'az', beam.elDeg, angles.map((a) => a - (options.shiftDeg ?? 0)));
  const noise = gaussian(mulberry32(options.seed));
  // A range floor at -45 dB, as on a real turntable.
  const lines = angles.map((a, i) => `${a.toFixed(2).replace('.', ',')};${(Math.max(db[i]!, -45) + (options.offsetDbm ?? 0) + options.noiseDb * noise()).toFixed(3).replace('.', ',')}`);
  return `angle_deg;received_dBm\n${lines.join('\n')}\n`;
}

describe('analyseCut(angles, powerDb) on published patterns', () => {
  it('finds HPBW ≈ 0.886·λ/(N·d) and a -13.26 dB first side lobe for a uniform 32-element λ/2 array (Balanis, Antenna Theory)', () => {
    const n = 32;
    const angles = Array.from({ length: 18001 }, (_, i) => -90 + i * 0.01);
    const db = angles.map((a) => {
      const psi = Math.PI * Math.sin((a * Math.PI) / 180);
      const af = Math.abs(psi) < 1e-12 ? 1 : Math.sin((n * psi) / 2) / (n * Math.sin(psi / 2));
      return 10 * Math.log10(Math.max(af * af, 1e-12));
    });
    const r = analyseCut(angles, db);
    // Balanis' large-N estimate; within 1 % at N = 32.
    expect(r.hpbwDeg).toBeCloseTo(((0.886 * 2) / n) * (180 / Math.PI), 0);
    expect(Math.abs(r.hpbwDeg / (((0.886 * 2) / n) * (180 / Math.PI)) - 1)).toBeLessThan(0.01);
    // -13.26 dB is the large-N limit; a 32-element array sits within 0.05 dB of it.
    expect(r.sllDb!).toBeCloseTo(-13.26, 1);
    expect(r.peakDeg).toBeCloseTo(0, 6);
    expect(r.clipped).toBe(false);
  });

  it('reports a beam cut short by the end of the scan as clipped, width to the end', () => {
    const angles = [0, 1, 2, 3, 4, 5];
    const r = analyseCut(angles, [0, -0.5, -1, -2, -4, -8]);
    expect(r.clipped).toBe(true);
    expect(r.halfPowerDeg[0]).toBe(0);
    expect(r.sllDb).toBeNull();
  });
});

describe('analyseMeasurement(design, beam, data) with generated measurement files', () => {
  // Tolerances stated here: noise σ = 0.3 dB at 0.5° steps; peak within 0.6°, HPBW within 5 %, SLL within 1.5 dB.
  it.each([0, 15, 30, -45, -60])('recovers the model peak, width and side lobes of the %d° beam from a noisy file', (az) => {
    const beam = { azDeg: az, elDeg: 0 };
    const data = parseRangeCsv(measuredFile(beam, { noiseDb: 0.3, seed: 100 + az, offsetDbm: -31 }));
    const a = analyseMeasurement(design, beam, data);
    const c = a.cuts[0]!;
    expect(c.plane).toBe('az');
    expect(Math.abs(c.difference.peakDeg)).toBeLessThan(0.6);
    expect(Math.abs(c.difference.hpbwDeg)).toBeLessThan(0.05 * c.model.hpbwDeg);
    expect(Math.abs(c.difference.sllDb!)).toBeLessThan(1.5);
    expect(c.measured.peakDb).toBeGreaterThan(-32);
    expect(c.measured.peakDb).toBeLessThan(-30);
  });

  it('agrees with the engine on the model side (the same codes through evaluateDesign, HPBW within 0.1°)', () => {
    const beam = { azDeg: 30, elDeg: 0 };
    const data = parseRangeCsv(measuredFile(beam, { noiseDb: 0, seed: 1 }));
    const a = analyseMeasurement(design, beam, data);
    const m = evaluateDesign({ ...design, codes: beamCodes(design, beam) });
    expect(a.cuts[0]!.model.peakDeg).toBeCloseTo(m.peakAzDeg, 1);
    expect(Math.abs(a.cuts[0]!.model.hpbwDeg - m.hpbwAzDeg)).toBeLessThan(0.1);
  });

  it('measures a module that points 2.5° off as a 2.5° peak difference, and peak alignment removes it', () => {
    const beam = { azDeg: 20, elDeg: 0 };
    const data = parseRangeCsv(measuredFile(beam, { noiseDb: 0.2, seed: 9, shiftDeg: 2.5 }));
    const c = analyseMeasurement(design, beam, data).cuts[0]!;
    expect(c.difference.peakDeg).toBeCloseTo(2.5, 0);
    const byPeak = overlayCuts(
      { angleDeg: data.angleDeg, powerDb: data.cuts[0]!.powerDb, peakDeg: c.measured.peakDeg, peakDb: c.measured.peakDb },
      { ...c.modelCut, peakDeg: c.model.peakDeg, peakDb: c.model.peakDb },
      { normalise: true, align: 'peak' },
    );
    expect(byPeak.shiftDeg).toBeCloseTo(-2.5, 0);
    const byAngle = overlayCuts(
      { angleDeg: data.angleDeg, powerDb: data.cuts[0]!.powerDb, peakDeg: c.measured.peakDeg, peakDb: c.measured.peakDb },
      { ...c.modelCut, peakDeg: c.model.peakDeg, peakDb: c.model.peakDb },
      { normalise: false, align: 'angle' },
    );
    expect(byAngle.shiftDeg).toBe(0);
    expect(byAngle.measured.angleDeg).toEqual(data.angleDeg);
    // Normalised to the fitted peak level, so the noisy top sits within a few noise σ of 0 dB.
    expect(Math.abs(Math.max(...byPeak.measured.powerDb))).toBeLessThan(1);
  });

  it('refuses codes that do not fit the candidate, naming the field', () => {
    const data = parseRangeCsv(measuredFile({ azDeg: 0, elDeg: 0 }, { noiseDb: 0, seed: 1 }));
    expect(() => analyseMeasurement(design, { azDeg: 0, elDeg: 0, codes: [1, 2, 3] }, data)).toThrow('beam.codes: must have 32 entries');
    expect(() => analyseMeasurement(design, { azDeg: 0, elDeg: 0, codes: new Array(32).fill(64) }, data)).toThrow('beam.codes[0]');
  });
});
