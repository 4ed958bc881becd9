import { describe, expect, it } from 'vitest';
import { attenuatorCode, attenuatorCodes, channelAmplitudes, evaluateDesign, wavelengthMm } from '../../../shared/engine/index.ts';
import { DesignSchema, type DesignInput } from '../../../shared/schemas/design.ts';

const LAMBDA = wavelengthMm(28);
const design = (extra: Partial<DesignInput>) => DesignSchema.parse({ frequencyGHz: 28, nx: 16, dxMm: LAMBDA / 2, ...extra });

describe('attenuator codes: round(-20·log10(a)/step), clipped to 0..2^bits - 1', () => {
  // Hand values: 20·log10(2) = 6.0206 dB, so a = 0.5 is 12.04 half-dB steps → 12; 1/√2 is 3.0103 dB → 6.
  it('a = 1 → 0, a = 0.5 → 12, a = 1/√2 → 6 at 0.5 dB steps and 6 bits', () => {
    expect(attenuatorCode(1, 0.5, 6)).toBe(0);
    expect(attenuatorCode(0.5, 0.5, 6)).toBe(12);
    expect(attenuatorCode(Math.SQRT1_2, 0.5, 6)).toBe(6);
  });
  it('clips to the last code: 3 bits stop at 7; a zero amplitude takes the last code', () => {
    expect(attenuatorCode(0.1, 0.5, 3)).toBe(7);
    expect(attenuatorCode(0, 1, 4)).toBe(15);
  });
  it('the design exposes one code per channel and the quantised amplitude 10^(-code·step/20)', () => {
    const d = design({ nx: 8, taperX: { kind: 'hamming' }, attenuatorStepDb: 1, attenuatorBits: 4 });
    const codes = attenuatorCodes(d)!;
    const a = channelAmplitudes(d);
    expect(codes.length).toBe(8);
    codes.forEach((c, i) => expect(Math.abs(a[i]! - 10 ** (-c / 20))).toBeLessThanOrEqual(1e-12));
    // Hamming(8) ends are 0.08 of the peak: 21.9 dB, clipped to 15 dB by a 4-bit, 1 dB attenuator.
    expect(codes[0]).toBe(15);
    expect(attenuatorCodes(design({}))).toBeNull();
  });
  it('both attenuator fields or neither: the schema names the missing one', () => {
    const r = DesignSchema.safeParse({ frequencyGHz: 28, nx: 4, dxMm: 5, attenuatorStepDb: 0.5 });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['attenuatorBits']);
  });
});

describe('quantised amplitude in every metric', () => {
  it('a coarse attenuator costs side-lobe level on a 35 dB Taylor taper; a fine one keeps it within 1 dB', () => {
    const taperX = { kind: 'taylor', sllDb: 35, nbar: 5 } as const;
    const ideal = evaluateDesign(design({ taperX }));
    const fine = evaluateDesign(design({ taperX, attenuatorStepDb: 0.25, attenuatorBits: 7 }));
    const coarse = evaluateDesign(design({ taperX, attenuatorStepDb: 3, attenuatorBits: 2 }));
    expect(Math.abs(fine.sllAzDb! - ideal.sllAzDb!)).toBeLessThanOrEqual(1);
    expect(coarse.sllAzDb!).toBeGreaterThan(ideal.sllAzDb! + 3);
  });
  it('element grouping with a 2-D taper: quantising the products still matches the conducted power of the codes', () => {
    const d = design({ nx: 6, ny: 5, taperX: { kind: 'hamming' }, taperY: { kind: 'taylor', sllDb: 30, nbar: 4 }, attenuatorStepDb: 0.5, attenuatorBits: 6, channelPowerDbm: 0 });
    const codes = attenuatorCodes(d)!;
    const sum = codes.reduce((s, c) => s + 10 ** ((-c * 0.5) / 10), 0);
    expect(Math.abs(evaluateDesign(d).conductedPowerDbm! - 10 * Math.log10(sum))).toBeLessThanOrEqual(0.01);
  });
});
