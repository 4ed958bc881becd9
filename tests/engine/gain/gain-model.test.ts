import { describe, expect, it } from 'vitest';
import fixture from '../../fixtures/engine/windows.json' with { type: 'json' };
import { channelAmplitudes, conductedPowerDbm, elementGainDbi, evaluateDesign, gainModel, wavelengthMm } from '../../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const F_GHZ = 28;
const LAMBDA = wavelengthMm(F_GHZ);
const D2R = Math.PI / 180;
const design = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: F_GHZ, nx: 8, dxMm: LAMBDA / 2, ...extra });
const db = (x: number) => 10 * Math.log10(x);

describe('element gain defaults', () => {
  // Balanis, Antenna Theory (3rd ed.), ch. 2 (directivity of U = cos^n θ over the upper hemisphere): D = 2(n + 1)
  // (the chapter is recalled from memory; the value follows from ∮cos^n θ dΩ = 2π/(n + 1) over the front hemisphere).
  for (const q of [0, 1, 1.5, 2, 4]) {
    it(`cos^${q} θ element: ${db(2 * (q + 1)).toFixed(2)} dBi, and a lone element's directivity agrees (±0.1 dB)`, () => {
      const d = design({ nx: 1, element: { kind: 'cosine', q } });
      const m = evaluateDesign(d);
      expect(Math.abs(m.elementGainDbi - db(2 * (q + 1)))).toBeLessThanOrEqual(0.1);
      expect(Math.abs(m.gainDbi - db(2 * (q + 1)))).toBeLessThanOrEqual(0.1);
      expect(Math.abs(m.directivityDbi - db(2 * (q + 1)))).toBeLessThanOrEqual(0.1);
    });
  }
  // 3GPP TR 38.901 (v17) Table 7.3-1: maximum directional gain of an antenna element 8 dBi.
  it('TR 38.901 element is 8 dBi at broadside (±0.1 dB); isotropic is 0 dBi', () => {
    expect(Math.abs(elementGainDbi({ kind: 'tr38901' }) - 8)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(elementGainDbi({ kind: 'isotropic' }))).toBeLessThanOrEqual(0.1);
  });
  it('a stated element.gainDbi wins over the default', () => {
    expect(elementGainDbi({ kind: 'cosine', q: 1.5, gainDbi: 5.5 })).toBe(5.5);
    expect(evaluateDesign(design({ element: { kind: 'tr38901', gainDbi: 6 } })).elementGainDbi).toBe(6);
  });
  // TR 38.901 Table 7.3-1: A_H(φ) = -min(12(φ/65°)², 30) dB, relative to the 8 dBi peak.
  for (const azDeg of [20, 45, 60]) {
    it(`a lone TR 38.901 element toward az ${azDeg}° has 8 - 12·(${azDeg}/65)² dBi (±0.1 dB)`, () => {
      const g = gainModel(design({ nx: 1, element: { kind: 'tr38901' } }));
      expect(Math.abs(g.gainDbiAt(azDeg * D2R, 0) - (8 - 12 * (azDeg / 65) ** 2))).toBeLessThanOrEqual(0.1);
    });
  }
});

describe('array gain, EIRP and conducted power', () => {
  // Common practice of array link budgets: a uniform N-element array radiates P_ch·N and adds N of gain on top
  // of its element's, so EIRP = P_ch + 20·log10 N + G_e at broadside.
  for (const [element, ge] of [[{ kind: 'tr38901' }, 8], [{ kind: 'cosine', q: 1.5 }, db(5)], [{ kind: 'isotropic' }, 0]] as const) {
    for (const [nx, ny] of [[4, 1], [8, 8]] as const) {
      it(`uniform ${nx}×${ny} ${element.kind} at 10 dBm per channel: EIRP = 10 + 20·log10(${nx * ny}) + ${ge.toFixed(2)} dBm (±0.1 dB)`, () => {
        const m = evaluateDesign(design({ nx, ny, element, channelPowerDbm: 10 }));
        expect(Math.abs(m.eirpDbm! - (10 + 20 * Math.log10(nx * ny) + ge))).toBeLessThanOrEqual(0.1);
        expect(Math.abs(m.conductedPowerDbm! - (10 + 10 * Math.log10(nx * ny)))).toBeLessThanOrEqual(0.1);
        expect(Math.abs(m.eirpAtSteerDbm! - m.eirpDbm!)).toBeLessThanOrEqual(0.1);
      });
    }
  }
  it('without channel power the power figures are null', () => {
    const m = evaluateDesign(design({}));
    expect(m.conductedPowerDbm).toBeNull();
    expect(m.eirpDbm).toBeNull();
    expect(m.eirpAtSteerDbm).toBeNull();
    expect(conductedPowerDbm(design({}))).toBeNull();
  });
  // Tapered channels deliver Σ a² of full power, a the SciPy windows (scipy.signal.windows, SciPy 1.17.1,
  // tests/fixtures/engine/windows.json) normalised to a peak of 1.
  const peakNormalised = (w: number[]) => w.map((x) => x / Math.max(...w));
  const sumSq = (w: number[]) => w.reduce((s, x) => s + x * x, 0);
  for (const n of ['8', '16', '32'] as const) {
    it(`hamming(${n}) columns at 0 dBm: conducted power 10·log10 Σ a² from SciPy's window (±0.1 dB)`, () => {
      const d = design({ nx: Number(n), taperX: { kind: 'hamming' }, channelPowerDbm: 0 });
      expect(Math.abs(conductedPowerDbm(d)! - db(sumSq(peakNormalised(fixture.hamming[n]))))).toBeLessThanOrEqual(0.1);
    });
  }
  for (const t of fixture.taylor.filter((x) => x.n === 16 || x.n === 32)) {
    it(`taylor(${t.n}, nbar ${t.nbar}, ${t.sll} dB) × hann(16) elements: conducted power from SciPy's windows (±0.1 dB)`, () => {
      const d = design({ nx: t.n, ny: 16, taperX: { kind: 'taylor', nbar: t.nbar, sllDb: t.sll }, taperY: { kind: 'hann' }, channelPowerDbm: 3 });
      const expected = 3 + db(sumSq(peakNormalised(t.w)) * sumSq(peakNormalised(fixture.hann['16'])));
      expect(Math.abs(conductedPowerDbm(d)! - expected)).toBeLessThanOrEqual(0.1);
    });
  }
  it('channel amplitudes follow the grouping: column → tx, row → ty, element → tx·ty (x fastest)', () => {
    const tx = peakNormalised(fixture.hamming['8']);
    const ty = peakNormalised(fixture.hann['5']);
    const col = channelAmplitudes(design({ nx: 8, ny: 5, taperX: { kind: 'hamming' }, taperY: { kind: 'hann' }, grouping: 'column' }));
    expect(col.length).toBe(8);
    col.forEach((a, i) => expect(Math.abs(a - tx[i]!)).toBeLessThanOrEqual(1e-12));
    const row = channelAmplitudes(design({ nx: 8, ny: 5, taperX: { kind: 'hamming' }, taperY: { kind: 'hann' }, grouping: 'row' }));
    row.forEach((a, i) => expect(Math.abs(a - ty[i]!)).toBeLessThanOrEqual(1e-12));
    const el = channelAmplitudes(design({ nx: 8, ny: 5, taperX: { kind: 'hamming' }, taperY: { kind: 'hann' } }));
    expect(Math.abs(el[2 * 8 + 3]! - tx[3]! * ty[2]!)).toBeLessThanOrEqual(1e-12);
  });
  // Balanis, Antenna Theory (3rd ed.), §6.4: an N-element array of isotropic elements at λ/2 has D = N at broadside
  // (and, as the sinc kernel vanishes at every λ/2 lag, (Σa)²/Σa² for any real taper, at any steer without
  // grating lobes); its gain, counted by the same elements, must agree.
  for (const [n, taper, steer] of [[4, 'uniform', 0], [16, 'uniform', 30], [16, 'hamming', 0], [32, 'hann', 40]] as const) {
    it(`${n} isotropic elements at λ/2, ${taper}, steer ${steer}°: gain equals directivity (±0.1 dB)`, () => {
      const m = evaluateDesign(design({ nx: n, taperX: { kind: taper }, steerAzDeg: steer }));
      expect(Math.abs(m.gainDbi - m.directivityDbi)).toBeLessThanOrEqual(0.1);
      if (taper === 'uniform') expect(Math.abs(m.gainDbi - db(n))).toBeLessThanOrEqual(0.1);
    });
  }
});

describe('scan and pointing loss', () => {
  // With continuous phase the array factor toward the steer is (Σa)², so the gain toward the steer falls by the
  // element alone: TR 38.901 Table 7.3-1 gives 12·(45/65)² = 5.75 dB at 45°; cos^q θ gives 10·q·log10(1/cos θ0)
  // (the same cos^n θ pattern). scanLossDb + pointingLossDb = G_bs - gainAtSteerDbi is that drop.
  it('4×1 TR 38.901 array steered to 45°: 12·(45/65)² = 5.75 dB below broadside toward the steer (±0.1 dB)', () => {
    const m = evaluateDesign(design({ nx: 4, element: { kind: 'tr38901' }, steerAzDeg: 45 }));
    expect(Math.abs(m.scanLossDb + m.pointingLossDb! - 12 * (45 / 65) ** 2)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(m.gainAtSteerDbi! - (8 + db(4) - 12 * (45 / 65) ** 2))).toBeLessThanOrEqual(0.1);
    expect(m.pointingLossDb!).toBeGreaterThan(0.1);
  });
  for (const steer of [-45, 45]) {
    it(`4×1 cos^1.5 array steered to ${steer}°: ${(15 * Math.log10(1 / Math.cos(45 * D2R))).toFixed(2)} dB below broadside toward the steer (±0.1 dB)`, () => {
      const m = evaluateDesign(design({ nx: 4, element: { kind: 'cosine', q: 1.5 }, steerAzDeg: steer }));
      expect(Math.abs(m.scanLossDb + m.pointingLossDb! - 15 * Math.log10(1 / Math.cos(45 * D2R)))).toBeLessThanOrEqual(0.1);
      expect(m.scanLossDb).toBeGreaterThan(1);
    });
  }
  it('at broadside scan and pointing loss are zero (±0.1 dB); with codes the steer figures are null', () => {
    const m = evaluateDesign(design({ ny: 4, element: { kind: 'cosine', q: 1 } }));
    expect(Math.abs(m.scanLossDb)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(m.pointingLossDb!)).toBeLessThanOrEqual(0.1);
    const c = evaluateDesign(design({ nx: 4, phaseBits: 2, codes: [0, 1, 2, 3], channelPowerDbm: 0 }));
    expect(c.gainAtSteerDbi).toBeNull();
    expect(c.pointingLossDb).toBeNull();
    expect(c.eirpAtSteerDbm).toBeNull();
    expect(c.eirpDbm).not.toBeNull();
  });
});

describe('gainModel', () => {
  it('samples the same gain as evaluateDesign at the peak and toward the steer (±0.01 dB), and the element floor behind', () => {
    const d = design({ nx: 6, ny: 3, element: { kind: 'tr38901' }, steerAzDeg: 30, steerElDeg: 10, taperX: { kind: 'hamming' }, channelPowerDbm: 5 });
    const m = evaluateDesign(d);
    const g = gainModel(d);
    expect(Math.abs(g.gainDbiAt(m.peakAzDeg * D2R, m.peakElDeg * D2R) - m.gainDbi)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(g.gainDbiAt(30 * D2R, 10 * D2R) - m.gainAtSteerDbi!)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(10 * Math.log10(g.gainAt(30 * D2R, 10 * D2R)) - m.gainAtSteerDbi!)).toBeLessThanOrEqual(0.01);
    expect(g.conductedPowerDbm).toBe(m.conductedPowerDbm);
    expect(g.elementGainDbi).toBe(8);
    // Behind, TR 38.901's element is at its 30 dB floor, so the array can be no more than N·(-22 dBi) there.
    expect(g.gainDbiAt(180 * D2R, 0)).toBeLessThanOrEqual(-22 + db(18) + 0.01);
  });
});

describe('unit-cell gain warning', () => {
  // 4π·A/λ² is the gain of a uniformly lit aperture A (Balanis, aperture antennas, ch. 12; recalled from memory);
  // a λ/2 × λ/2 cell gives π (4.97 dBi).
  it('8×8 at λ/2 warns for an 8 dBi element and not for a 4 dBi one', () => {
    const codes = (gainDbi: number) => evaluateDesign(design({ ny: 8, element: { kind: 'tr38901', gainDbi } })).warnings.map((w) => w.code);
    expect(codes(8)).toContain('element-gain-above-unit-cell');
    expect(codes(4)).not.toContain('element-gain-above-unit-cell');
  });
  it('a line of elements never warns (no unit cell in y)', () => {
    expect(evaluateDesign(design({ element: { kind: 'tr38901' } })).warnings.map((w) => w.code)).not.toContain('element-gain-above-unit-cell');
  });
});
