import { describe, expect, it } from 'vitest';
import { gainVsSteer } from '../../../shared/engine/gain/gain-vs-steer.ts';
import { wavelengthMm } from '../../../shared/engine/index.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';

describe('gainVsSteer(design, axis, angles)', () => {
  // TR 38.901 Table 7.3-1: the element falls 12·(θ/65°)² below its 8 dBi peak; with continuous phase the array adds
  // 10·log10 N toward every steer, so the curve sits N above the element's (4 elements: 6.02 dB).
  it('a 4×1 TR 38.901 array: gain toward the steer = element gain toward it + 10·log10 4 (±0.1 dB)', () => {
    const d = DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: wavelengthMm(28) / 2, element: { kind: 'tr38901' }, phaseBits: 6 });
    const r = gainVsSteer(d, 'az', [-60, -30, 0, 30, 45, 60]);
    r.anglesDeg.forEach((a, i) => {
      expect(Math.abs(r.elementDbi[i]! - (8 - 12 * (a / 65) ** 2))).toBeLessThanOrEqual(0.1);
      // 6-bit codes: the quantisation loss toward the steer is a few hundredths of a dB at most for 4 elements.
      expect(Math.abs(r.gainDbi[i]! - (r.elementDbi[i]! + 10 * Math.log10(4)))).toBeLessThanOrEqual(0.1);
    });
  });
});
