/**
 * Sampling step in direction cosine for an axis of n elements at pitch d/λ: about four samples per
 * null-to-null spacing λ/(n·d), never coarser than 0.05 (the element patterns are smooth).
 */
export function gridStep(n: number, pitchWavelengths: number): number {
  if (n <= 1) return 0.05;
  return Math.min(0.05, 0.25 / (n * pitchWavelengths));
}

/** Cut sampling step in radians for an aperture of the given length in wavelengths (8 samples per lobe). */
export function cutStepRad(apertureWavelengths: number): number {
  const maxStepRad = (0.5 * Math.PI) / 180;
  return apertureWavelengths > 0 ? Math.min(maxStepRad, 1 / (8 * apertureWavelengths)) : maxStepRad;
}
