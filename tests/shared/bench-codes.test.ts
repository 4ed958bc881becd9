import { describe, expect, it } from 'vitest';
import { channelCodes } from '../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../shared/schemas/design.ts';
import { beamCodes } from '../../shared/bench/beam-codes.ts';
import { BenchInputError } from '../../shared/bench/bench-input-error.ts';
import { offsetArrays } from '../../shared/bench/calibration.ts';
import { codesCsv } from '../../shared/bench/codes-csv.ts';
import { codesTable, predictCodes } from '../../shared/bench/codes-table.ts';
import { parseBeamRange } from '../../shared/bench/parse-beam-range.ts';

const design = (over: Partial<DesignInput> = {}) =>
  DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, phaseBits: 6, grouping: 'column', element: { kind: 'cosine', q: 2 }, ...over });

describe('beamCodes(design, beam)', () => {
  it('gives 0, 49, 34, 19 for steer -30° in the 4-column 6-bit 5 mm 28 GHz array (the engine contract example)', () => {
    expect(beamCodes(design(), { azDeg: -30, elDeg: 0 })).toEqual([0, 49, 34, 19]);
  });

  it('gives 0, 15, 30, 45 for steer +30° (bench figures for a 28 GHz handset module, common practice)', () => {
    expect(beamCodes(design(), { azDeg: 30, elDeg: 0 })).toEqual([0, 15, 30, 45]);
  });

  it('matches the engine channelCodes for element grouping over many beams', () => {
    const d = design({ nx: 4, ny: 3, dyMm: 6, grouping: 'element', phaseBits: 5 });
    for (let az = -80; az <= 80; az += 7) {
      for (const el of [-40, -5, 0, 23, 60]) {
        const engine = channelCodes({ ...d, steerAzDeg: az, steerElDeg: el });
        expect(beamCodes(d, { azDeg: az, elDeg: el })).toEqual(engine);
      }
    }
  });

  it('compensates measured phase offsets: the applied phase -code·step + φc lands within half a step of the ideal', () => {
    const d = design({ nx: 8, dxMm: 5.35 });
    const cal = [17, -40, 95, 3, -170, 61, 12, -88].map((phaseDeg, i) => ({ channel: i + 1, gainDb: 0, phaseDeg }));
    const offsets = offsetArrays(cal, 8);
    const codes = beamCodes(d, { azDeg: 25, elDeg: 0 }, offsets);
    const step = 360 / 64;
    const delta = (360 * (d.dxMm / (299792458 / 28e9 * 1e3))) * Math.sin((25 * Math.PI) / 180);
    codes.forEach((code, m) => {
      const applied = -code * step + offsets.phaseDeg[m]!;
      const ideal = -m * delta;
      const diff = ((((applied - ideal + 180) % 360) + 360) % 360) - 180;
      expect(Math.abs(diff)).toBeLessThanOrEqual(step / 2 + 1e-9);
    });
  });

  it('refuses el steering with column grouping, naming the beam field', () => {
    expect(() => beamCodes(design(), { azDeg: 0, elDeg: 10 }, undefined, 'beams[3]')).toThrow('beams[3].elDeg');
  });

  it('refuses a design without phase bits', () => {
    expect(() => beamCodes(design({ phaseBits: null }), { azDeg: 0, elDeg: 0 })).toThrow(BenchInputError);
  });
});

describe('codesTable(design, beams, options)', () => {
  it('predicts the +30° beam near 28° (bench figures, common practice; cosine element q = 2, within 5°)', () => {
    const t = codesTable(design(), [{ azDeg: 30, elDeg: 0 }]);
    expect(Math.abs(t.rows[0]!.peakAzDeg - 28)).toBeLessThan(5);
    expect(Math.abs(t.rows[0]!.hpbwAzDeg - 30)).toBeLessThan(4);
  });

  it('warns when the pointing error exceeds the user threshold, and not below it', () => {
    const beams = [{ azDeg: 30, elDeg: 0 }];
    const strict = codesTable(design(), beams, { pointingThresholdDeg: 1 });
    const loose = codesTable(design(), beams, { pointingThresholdDeg: 10 });
    expect(strict.rows[0]!.warnings.map((w) => w.code)).toContain('pointing-error');
    expect(loose.rows[0]!.warnings.map((w) => w.code)).not.toContain('pointing-error');
  });

  it('warns of a visible grating lobe at one-wavelength pitch steered off broadside (Balanis: d/λ ≥ 1/(1 + |sin θ0|))', () => {
    const lambda = 299792458 / 28e9 * 1e3;
    const t = codesTable(design({ dxMm: lambda, element: { kind: 'isotropic' } }), [{ azDeg: 20, elDeg: 0 }]);
    expect(t.rows[0]!.warnings.map((w) => w.code)).toContain('grating-lobe-visible');
    const fine = codesTable(design({ dxMm: lambda / 2, element: { kind: 'isotropic' } }), [{ azDeg: 20, elDeg: 0 }]);
    expect(fine.rows[0]!.warnings.map((w) => w.code)).not.toContain('grating-lobe-visible');
  });

  it('includes calibration gains in the prediction: a strong edge taper widens the beam', () => {
    const d = design({ nx: 8, dxMm: 5.35, element: { kind: 'isotropic' } });
    const plain = codesTable(d, [{ azDeg: 0, elDeg: 0 }]);
    const tapered = codesTable(d, [{ azDeg: 0, elDeg: 0 }], {
      calibration: [-12, -6, -2, 0, 0, -2, -6, -12].map((gainDb, i) => ({ channel: i + 1, gainDb, phaseDeg: 0 })),
    });
    expect(tapered.calibrated).toBe(true);
    expect(tapered.rows[0]!.hpbwAzDeg).toBeGreaterThan(plain.rows[0]!.hpbwAzDeg * 1.1);
    expect(tapered.rows[0]!.sllAzDb!).toBeLessThan(plain.rows[0]!.sllAzDb! - 5);
  });

  it('restores pointing with compensated codes, where uncompensated codes on the same module mis-point', () => {
    const d = design({ nx: 8, dxMm: 5.35, element: { kind: 'isotropic' } });
    // A linear phase slope across the channels (a cable-length error) tilts the beam if not compensated.
    const cal = Array.from({ length: 8 }, (_, i) => ({ channel: i + 1, gainDb: 0, phaseDeg: 30 * i - 105 }));
    const offsets = offsetArrays(cal, 8);
    const beam = { azDeg: 20, elDeg: 0 };
    const naive = predictCodes(d, beamCodes(d, beam), offsets, beam);
    const compensated = predictCodes(d, beamCodes(d, beam, offsets), offsets, beam);
    expect(naive.pointingErrorDeg!).toBeGreaterThan(5);
    expect(compensated.pointingErrorDeg!).toBeLessThan(1);
  });

  it('reports the naive doubled codes 0, 30, 60, 26 peaking near 50° with a beam about 30° wide (bench figures, common practice; q = 2)', () => {
    const p = predictCodes(design(), [0, 30, 60, 26], undefined, null);
    expect(p.pointingErrorDeg).toBeNull();
    expect(Math.abs(p.peakAzDeg - 50)).toBeLessThan(5);
    expect(Math.abs(p.hpbwAzDeg - 30)).toBeLessThan(4);
    expect(p.sllAzDb).not.toBeNull();
  });

  it('says the beam is beyond the visible region when the code step exceeds 360·d/λ', () => {
    // 6-bit codes 0, 32, 0, 32 are 180° steps; at d = 0.3 λ the largest real step is 108°.
    const lambda = 299792458 / 28e9 * 1e3;
    const p = predictCodes(design({ dxMm: 0.3 * lambda }), [0, 32, 0, 32], undefined, null);
    expect(p.beamVisible).toBe(false);
  });
});

describe('codesCsv(table)', () => {
  it('writes the azDeg,elDeg,ch1..chN header, then one row per beam with the codes', () => {
    const t = codesTable(design(), parseBeamRange('-30:30:30'));
    // The '#' header block comes first; the table follows it.
    const lines = codesCsv(t).trim().split('\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('azDeg,elDeg,ch1,ch2,ch3,ch4,peakAzDeg,peakElDeg,pointingErrorDeg,hpbwAzDeg,hpbwElDeg,warnings');
    expect(lines).toHaveLength(4);
    expect(lines[1]!.split(',').slice(0, 6)).toEqual(['-30', '0', '0', '49', '34', '19']);
    expect(lines[3]!.split(',').slice(0, 6)).toEqual(['30', '0', '0', '15', '30', '45']);
    expect(lines[3]!.split(',')).toHaveLength(12);
  });
});

describe('codesCsv(table): header block, attenuation codes and channel map', () => {
  it('names candidate, frequency and steps, and lists which elements each column channel feeds', () => {
    const t = codesTable(design({ ny: 2 }), parseBeamRange('0:0:1'), { candidate: 'Four column' });
    const head = codesCsv(t).split('\n').filter((l) => l.startsWith('#'));
    expect(head).toContain('# candidate: Four column');
    expect(head).toContain('# frequencyGHz: 28');
    // 6 bits: 360/64 = 5.625° per code.
    expect(head).toContain('# phase: 6 bits; 5.625 deg per code');
    expect(head).toContain('# attenuator: none (continuous amplitude)');
    expect(head).toContain('# ch2 feeds (m n): (1 0) (1 1)');
    expect(t.channelElements).toHaveLength(4);
  });
  it('puts one attenuation code per channel beside the phase codes (hamming(4) at 0.5 dB steps: 39, 0, 0, 39)', () => {
    // Hamming(4) = 0.08, 0.77, 0.77, 0.08 (scipy.signal.windows.hamming(4)); peak-normalised 0.1039, 1, 1, 0.1039:
    // -20·log10(0.1039) = 19.67 dB → round(19.67/0.5) = 39 codes; 1 → 0.
    const t = codesTable(design({ taperX: { kind: 'hamming' }, attenuatorStepDb: 0.5, attenuatorBits: 6 }), parseBeamRange('-30:30:30'));
    expect(t.attenuation).toEqual([39, 0, 0, 39]);
    const lines = codesCsv(t).trim().split('\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('azDeg,elDeg,ch1,ch2,ch3,ch4,attCh1,attCh2,attCh3,attCh4,peakAzDeg,peakElDeg,pointingErrorDeg,hpbwAzDeg,hpbwElDeg,warnings');
    expect(lines[1]!.split(',').slice(0, 10)).toEqual(['-30', '0', '0', '49', '34', '19', '39', '0', '0', '39']);
    expect(codesCsv(t)).toContain('# attenuator: 6 bits; 0.5 dB per code (code 0 = full amplitude)');
  });
});

describe('parseBeamRange(spec)', () => {
  it('includes both ends of -60:60:15', () => {
    expect(parseBeamRange('-60:60:15').map((b) => b.azDeg)).toEqual([-60, -45, -30, -15, 0, 15, 30, 45, 60]);
  });
  it('runs downward when START > STOP and keeps decimal steps clean', () => {
    expect(parseBeamRange('60:-60:60').map((b) => b.azDeg)).toEqual([60, 0, -60]);
    expect(parseBeamRange('0:0.3:0.1').map((b) => b.azDeg)).toEqual([0, 0.1, 0.2, 0.3]);
  });
  it.each(['', '10', '0:10', 'a:b:c', '0:10:0', '-100:0:10', '0:90:0.01', '1:2:3:4'])('refuses %j naming the beams field', (spec) => {
    expect(() => parseBeamRange(spec)).toThrow(/^beams: /);
  });
});
