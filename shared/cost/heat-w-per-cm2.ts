/**
 * Heat density over the module outline (W/cm²): the DC draw less the RF power the PAs send to the antenna (which
 * leaves as radiation, antenna losses neglected), spread over the board. 1 cm² = 100 mm².
 */
export function heatWPerCm2(dcPowerW: number, radiatedW: number, boardAreaMm2: number): number | null {
  if (!(boardAreaMm2 >= 0)) throw new RangeError('invalid boardAreaMm2');
  if (boardAreaMm2 === 0) return null;
  return Math.max(0, dcPowerW - radiatedW) / (boardAreaMm2 / 100);
}
