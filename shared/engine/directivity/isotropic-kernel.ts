/**
 * Pair kernel of isotropic elements: ∮ exp(j·k·r·cos γ) dΩ = 4π·sin(kr)/(kr) (Balanis, Antenna Theory,
 * directivity of arrays by element pairs). G[a·ny + b] for lattice offsets (a·dx, b·dy), a, b ≥ 0.
 */
export function isotropicKernel(nx: number, ny: number, kdx: number, kdy: number): Float64Array {
  const g = new Float64Array(nx * ny);
  for (let a = 0; a < nx; a++) {
    for (let b = 0; b < ny; b++) {
      const kr = Math.hypot(a * kdx, b * kdy);
      g[a * ny + b] = kr === 0 ? 4 * Math.PI : (4 * Math.PI * Math.sin(kr)) / kr;
    }
  }
  return g;
}
