/**
 * Local quadratic least-squares smoothing (Savitzky & Golay, Anal. Chem. 36, 1964) over ±halfWindowDeg
 * around each sample, for unevenly spaced angles: measurement noise averages out while the beam's
 * curvature (second order) is kept, so the peak and the -3 dB points are not pulled.
 */
interface Quadratic {
  c0: number;
  c1: number;
  c2: number;
  count: number;
}

/**
 * Normal equations of y ≈ c0 + c1·x + c2·x² over samples lo..hi within ±halfWindowDeg of centreDeg
 * (x from the centre), solved by Cramer's rule; NaN coefficients when fewer than 3 samples or singular.
 */
function fitRange(angleDeg: readonly number[], powerDb: readonly number[], centreDeg: number, halfWindowDeg: number, lo: number, hi: number): Quadratic {
  let s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, t0 = 0, t1 = 0, t2 = 0;
  for (let k = lo; k <= hi; k++) {
    const x = angleDeg[k]! - centreDeg;
    if (Math.abs(x) > halfWindowDeg) continue;
    const y = powerDb[k]!;
    const x2 = x * x;
    s0 += 1;
    s1 += x;
    s2 += x2;
    s3 += x2 * x;
    s4 += x2 * x2;
    t0 += y;
    t1 += y * x;
    t2 += y * x2;
  }
  const det = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
  if (s0 < 3 || det === 0) return { c0: NaN, c1: NaN, c2: NaN, count: s0 };
  return {
    c0: (t0 * (s2 * s4 - s3 * s3) - s1 * (t1 * s4 - s3 * t2) + s2 * (t1 * s3 - s2 * t2)) / det,
    c1: (s0 * (t1 * s4 - s3 * t2) - t0 * (s1 * s4 - s3 * s2) + s2 * (s1 * t2 - t1 * s2)) / det,
    c2: (s0 * (s2 * t2 - t1 * s3) - s1 * (s1 * t2 - t1 * s2) + t0 * (s1 * s3 - s2 * s2)) / det,
    count: s0,
  };
}

/** Least-squares quadratic y ≈ c0 + c1·x + c2·x² of the samples within ±halfWindowDeg of centreDeg (x from the centre). */
export function quadraticFit(angleDeg: readonly number[], powerDb: readonly number[], centreDeg: number, halfWindowDeg: number): Quadratic {
  return fitRange(angleDeg, powerDb, centreDeg, halfWindowDeg, 0, angleDeg.length - 1);
}

export function smoothDb(angleDeg: readonly number[], powerDb: readonly number[], halfWindowDeg: number): number[] {
  const n = angleDeg.length;
  const out = new Array<number>(n);
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < n; i++) {
    const a = angleDeg[i]!;
    while (angleDeg[lo]! < a - halfWindowDeg) lo++;
    while (hi + 1 < n && angleDeg[hi + 1]! <= a + halfWindowDeg) hi++;
    if (hi - lo < 3) {
      out[i] = powerDb[i]!;
      continue;
    }
    // The window lo..hi is sorted around sample i; only the fitted value at i (c0) is needed.
    const { c0 } = fitRange(angleDeg, powerDb, a, halfWindowDeg, lo, hi);
    out[i] = Number.isNaN(c0) ? powerDb[i]! : c0;
  }
  return out;
}
