/**
 * Antenna board (the module outline): the aperture plus `marginMm` beyond it on every side, in mm².
 * The margin carries the ground clearance, routing and mounting a team allows around the radiating elements.
 */
export function boardAreaMm2(apertureXMm: number, apertureYMm: number, marginMm: number): number {
  if (!(apertureXMm >= 0) || !(apertureYMm >= 0) || !(marginMm >= 0)) throw new RangeError('invalid board size');
  return (apertureXMm + 2 * marginMm) * (apertureYMm + 2 * marginMm);
}
