import { DEG_PER_RAD } from '../constants.ts';

/**
 * Scan angle (degrees) at which a grating lobe enters visible space for pitch d/λ:
 * d/λ ≥ 1/(1 + |sin θ0|) (Balanis, Antenna Theory), so θ0 = asin(λ/d - 1); 90 for d ≤ λ/2,
 * 0 when λ/d - 1 ≤ 0, null for an axis of one element.
 */
export function gratingLobeOnsetDeg(n: number, pitchWavelengths: number): number | null {
  if (n <= 1) return null;
  if (pitchWavelengths <= 0.5) return 90;
  const s = 1 / pitchWavelengths - 1;
  return s <= 0 ? 0 : Math.asin(s) * DEG_PER_RAD;
}
