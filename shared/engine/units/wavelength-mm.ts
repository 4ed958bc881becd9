import { SPEED_OF_LIGHT_M_S } from '../constants.ts';

/** Free-space wavelength in mm for a carrier in GHz (λ = c/f). */
export function wavelengthMm(frequencyGHz: number): number {
  return SPEED_OF_LIGHT_M_S / (frequencyGHz * 1e9) * 1e3;
}
