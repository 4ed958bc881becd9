import { gaussLegendreOn } from '../util/gauss-legendre.ts';

/**
 * Pair kernel of cos^q θ elements (front hemisphere only). Over the u-v disk dΩ = du·dv/w, so
 * G(ρ) = ∫∫ (1-u²-v²)^((q-1)/2)·cos(ρu) du dv, rotation-invariant in the offset vector; integrating v
 * in closed form (a Beta function) leaves K(ρ) ∝ ∫_0^{π/2} cos^(q+1)t·cos(ρ·sin t) dt (Poisson's
 * Bessel integral, Watson §3.3), normalised by K(0) = 2π/(q+1).
 */
export function cosineKernel(nx: number, ny: number, kdx: number, kdy: number, q: number): Float64Array {
  if (!(q >= 0)) throw new RangeError('invalid q');
  const rhoMax = Math.hypot((nx - 1) * kdx, (ny - 1) * kdy);
  const nodes = 32 + Math.ceil(0.7 * rhoMax);
  const { x, w } = gaussLegendreOn(nodes, 0, Math.PI / 2);
  const weight = new Float64Array(nodes);
  const sinT = new Float64Array(nodes);
  let i0 = 0;
  for (let i = 0; i < nodes; i++) {
    weight[i] = w[i]! * Math.cos(x[i]!) ** (q + 1);
    sinT[i] = Math.sin(x[i]!);
    i0 += weight[i]!;
  }
  const scale = (2 * Math.PI) / (q + 1) / i0;
  const g = new Float64Array(nx * ny);
  for (let a = 0; a < nx; a++) {
    for (let b = 0; b < ny; b++) {
      const rho = Math.hypot(a * kdx, b * kdy);
      let s = 0;
      for (let i = 0; i < nodes; i++) s += weight[i]! * Math.cos(rho * sinT[i]!);
      g[a * ny + b] = s * scale;
    }
  }
  return g;
}
