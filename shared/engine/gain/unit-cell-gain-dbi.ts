/**
 * The most gain one element of a planar lattice can have: 10·log10(4π·dx·dy/λ²), its unit cell's aperture
 * gain (Hansen, Phased Array Antennas, element gain of a cell in a large array). Above it, a stated element
 * gain is optimistic.
 */
export function unitCellGainDbi(dxMm: number, dyMm: number, lambdaMm: number): number {
  return 10 * Math.log10((4 * Math.PI * dxMm * dyMm) / (lambdaMm * lambdaMm));
}
