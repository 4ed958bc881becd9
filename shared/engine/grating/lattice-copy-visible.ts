/**
 * Whether a lattice copy (u + p/dxλ, v + q/dyλ), (p, q) ≠ (0, 0), of a reference direction lies in
 * the visible disk u² + v² ≤ 1, counting only axes with more than one element. With includeSelf the
 * reference itself (p = q = 0) counts too: "some copy is visible".
 */
export function latticeCopyVisible(
  u: number,
  v: number,
  nx: number,
  ny: number,
  dxWavelengths: number,
  dyWavelengths: number,
  includeSelf = false,
): boolean {
  const pMax = nx > 1 ? Math.ceil(2 * dxWavelengths + Math.abs(u) * dxWavelengths) + 1 : 0;
  const qMax = ny > 1 ? Math.ceil(2 * dyWavelengths + Math.abs(v) * dyWavelengths) + 1 : 0;
  const eps = 1e-12;
  for (let p = -pMax; p <= pMax; p++) {
    for (let q = -qMax; q <= qMax; q++) {
      if (p === 0 && q === 0 && !includeSelf) continue;
      const uu = u + p / dxWavelengths;
      const vv = v + q / dyWavelengths;
      if (uu * uu + vv * vv <= 1 + eps) return true;
    }
  }
  return false;
}
