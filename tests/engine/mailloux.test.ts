import { describe, expect, it } from 'vitest';
import { channelCodes, evaluateDesign, progressivePhaseDeg, wavelengthMm } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

const F_GHZ = 10;
const LAMBDA = wavelengthMm(F_GHZ);

// Mailloux, Phased Array Antenna Handbook (2nd ed.), §7.2: with B-bit phase shifters and no
// randomisation, the peak quantization lobe of a long array is near 1/2^(2B), i.e. -6.02·B dB; the
// worst case is a sawtooth phase error (one code step every few elements). A 60 dB Chebyshev taper
// keeps the ordinary side lobes below it.
describe('Mailloux: phase quantization', () => {
  for (const bits of [3, 4, 5]) {
    it(`a 64-element array with ${bits}-bit phase shows its peak quantization lobe near -6.02·${bits} dB (±1.5 dB)`, () => {
      const stepDeg = 360 / 2 ** bits;
      // Progressive phase of one eighth of a step: codes rise by one every 8 elements.
      const u0 = stepDeg / 8 / (360 * 0.5);
      const d = DesignSchema.parse({
        frequencyGHz: F_GHZ, nx: 64, dxMm: LAMBDA / 2, taperX: { kind: 'chebyshev', sllDb: 60 },
        phaseBits: bits, steerAzDeg: (Math.asin(u0) * 180) / Math.PI,
      });
      expect(Math.abs(evaluateDesign(d).sllAzDb! + 6.02 * bits)).toBeLessThanOrEqual(1.5);
    });
  }
  for (const bits of [2, 3, 6]) {
    it(`the RMS phase error of a ${bits}-bit shifter over many steers is step/√12 (±3 %)`, () => {
      const step = 360 / 2 ** bits;
      let sum = 0;
      let count = 0;
      for (let i = 0; i < 400; i++) {
        const steer = -60 + (120 * (i + 0.37)) / 400;
        const d = DesignSchema.parse({ frequencyGHz: F_GHZ, nx: 32, dxMm: LAMBDA / 2, phaseBits: bits, steerAzDeg: steer });
        const codes = channelCodes(d)!;
        const { dxDeg } = progressivePhaseDeg(d);
        codes.forEach((c, m) => {
          // Applied -c·step against ideal -m·Δx, wrapped to (-180, 180].
          let e = (-c * step + m * dxDeg) % 360;
          if (e > 180) e -= 360;
          if (e <= -180) e += 360;
          sum += e * e;
          count++;
        });
      }
      expect(Math.abs(Math.sqrt(sum / count) / (step / Math.sqrt(12)) - 1)).toBeLessThanOrEqual(0.03);
    });
  }
});
