/**
 * |Σ_m a_m·exp(j·m·kd·s)|² for a line of n complex weights at direction cosine s, by Horner's rule
 * (one sin/cos per call, no allocation). Element offsets from the centre only add a common phase.
 */
export function linePower(re: Float64Array, im: Float64Array, n: number, kd: number, s: number): number {
  // One element (every ny = 1 array's y factor): no phase to turn, so skip the sine and cosine.
  if (n === 1) return re[0]! * re[0]! + im[0]! * im[0]!;
  const zr = Math.cos(kd * s);
  const zi = Math.sin(kd * s);
  let sr = re[n - 1]!;
  let si = im[n - 1]!;
  for (let m = n - 2; m >= 0; m--) {
    const tr = sr * zr - si * zi + re[m]!;
    si = sr * zi + si * zr + im[m]!;
    sr = tr;
  }
  return sr * sr + si * si;
}
