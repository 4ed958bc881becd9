import { createMemo } from './memo.ts';

const rules = createMemo<{ x: Float64Array; w: Float64Array }>(64);

/**
 * n-point Gauss-Legendre nodes and weights on [-1, 1], by Newton iteration on P_n
 * (Golub & Welsch give the same rule; this is the classic Numerical Recipes "gauleg" scheme).
 */
export function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  if (!Number.isInteger(n) || n < 1) throw new RangeError('invalid n');
  return rules.get(String(n), () => {
    const x = new Float64Array(n);
    const w = new Float64Array(n);
    for (let i = 0; i < Math.ceil(n / 2); i++) {
      let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
      let dp = 0;
      for (let it = 0; it < 100; it++) {
        let p0 = 1;
        let p1 = 0;
        for (let j = 0; j < n; j++) {
          const p2 = p1;
          p1 = p0;
          p0 = ((2 * j + 1) * z * p1 - j * p2) / (j + 1);
        }
        dp = (n * (z * p0 - p1)) / (z * z - 1);
        const dz = p0 / dp;
        z -= dz;
        if (Math.abs(dz) < 1e-15) break;
      }
      x[i] = -z;
      x[n - 1 - i] = z;
      w[i] = w[n - 1 - i] = 2 / ((1 - z * z) * dp * dp);
    }
    return { x, w };
  });
}

/** Nodes and weights mapped to [a, b] (written into new arrays). */
export function gaussLegendreOn(n: number, a: number, b: number): { x: Float64Array; w: Float64Array } {
  const rule = gaussLegendre(n);
  const half = (b - a) / 2;
  const mid = (a + b) / 2;
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = mid + half * rule.x[i]!;
    w[i] = half * rule.w[i]!;
  }
  return { x, w };
}
