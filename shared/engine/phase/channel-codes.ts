import type { Design } from '../../schemas/design.ts';
import { RAD_PER_DEG } from '../constants.ts';
import { wavelengthMm } from '../units/wavelength-mm.ts';

/** Progressive phase per element along x and y in degrees for the design's steer: Δ = 360·(d/λ)·(u0, v0). */
export function progressivePhaseDeg(design: Design): { dxDeg: number; dyDeg: number } {
  const lambda = wavelengthMm(design.frequencyGHz);
  const az = design.steerAzDeg * RAD_PER_DEG;
  const el = design.steerElDeg * RAD_PER_DEG;
  const u0 = Math.sin(az) * Math.cos(el);
  const v0 = Math.sin(el);
  return {
    dxDeg: design.grouping === 'row' ? 0 : 360 * (design.dxMm / lambda) * u0,
    dyDeg: design.grouping === 'column' ? 0 : 360 * (design.dyMm / lambda) * v0,
  };
}

/**
 * Phase-shifter codes, one per channel, or null for continuous phase. Explicit codes win over steer.
 * code = round((m·Δx + n·Δy)/step) mod 2^B, halves rounded up, never negative; channels from the -x/-y end, x fastest.
 */
export function channelCodes(design: Design): number[] | null {
  if (design.codes) return [...design.codes];
  if (design.phaseBits === null) return null;
  const levels = 2 ** design.phaseBits;
  const step = 360 / levels;
  const { dxDeg, dyDeg } = progressivePhaseDeg(design);
  const code = (m: number, n: number): number => {
    const c = Math.floor((m * dxDeg + n * dyDeg) / step + 0.5) % levels;
    return c < 0 ? c + levels : c;
  };
  const out: number[] = [];
  if (design.grouping === 'column') for (let m = 0; m < design.nx; m++) out.push(code(m, 0));
  else if (design.grouping === 'row') for (let n = 0; n < design.ny; n++) out.push(code(0, n));
  else for (let n = 0; n < design.ny; n++) for (let m = 0; m < design.nx; m++) out.push(code(m, n));
  return out;
}
