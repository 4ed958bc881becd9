import { describe, expect, it } from 'vitest';
import { channelCodes, evaluateDesign, wavelengthMm } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

const F_GHZ = 10;
const LAMBDA = wavelengthMm(F_GHZ);

// The first quantisation lobe of a sawtooth phase error. With B bits (M = 2^B levels) and a progressive phase that
// climbs one code step every P elements, the phase error repeats every P elements as a ramp from −π/M to +π/M, so
// exp(jε) has Fourier coefficients c_p ∝ sinc(p − 1/M) (Mailloux, Phased Array Antenna Handbook, 2nd ed., §7.2,
// periodic phase error). The first lobe against the main beam is |sinc(1/M − 1)/sinc(1/M)| = (1/M)/(1 − 1/M)
// = 1/(M − 1), i.e. 20·log10(1/(2^B − 1)): −16.90, −23.52 and −29.83 dB for 3, 4 and 5 bits. A 60 dB Chebyshev
// taper keeps the ordinary side lobes below it; the taper's finite length leaves the lobe a few tenths low.
describe('Mailloux: phase quantization', () => {
  for (const bits of [3, 4, 5]) {
    const exact = 20 * Math.log10(1 / (2 ** bits - 1));
    it(`a 64-element array with ${bits}-bit phase shows its first quantisation lobe at 20·log10(1/(2^${bits} − 1)) = ${exact.toFixed(2)} dB (±0.3 dB)`, () => {
      const stepDeg = 360 / 2 ** bits;
      // Progressive phase of one eighth of a step: codes rise by one every 8 elements.
      const u0 = stepDeg / 8 / (360 * 0.5);
      const d = DesignSchema.parse({
        frequencyGHz: F_GHZ, nx: 64, dxMm: LAMBDA / 2, taperX: { kind: 'chebyshev', sllDb: 60 },
        phaseBits: bits, steerAzDeg: (Math.asin(u0) * 180) / Math.PI,
      });
      expect(Math.abs(evaluateDesign(d).sllAzDb! - exact)).toBeLessThanOrEqual(0.3);
    });
  }
  // The RMS of a uniformly distributed rounding error over one step is step/√12 (common practice: the variance of a
  // uniform distribution).
  for (const bits of [2, 3, 6]) {
    it(`the RMS phase error of a ${bits}-bit shifter over many steers is step/√12 (±3 %)`, () => {
      const step = 360 / 2 ** bits;
      let sum = 0;
      let count = 0;
      for (let i = 0; i < 400; i++) {
        const steer = -60 + (120 * (i + 0.37)) / 400;
        const d = DesignSchema.parse({ frequencyGHz: F_GHZ, nx: 32, dxMm: LAMBDA / 2, phaseBits: bits, steerAzDeg: steer });
        const codes = channelCodes(d)!;
        const dxDeg = 180 * Math.sin((steer * Math.PI) / 180); // 360·(d/λ)·sin θ0 at d = λ/2
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
