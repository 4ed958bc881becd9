const INV_PHI = (Math.sqrt(5) - 1) / 2;

/**
 * Maximum of a unimodal f on [lo, hi] by golden-section search (Kiefer 1953).
 * Returns the abscissa and value; tolRad is the final bracket width.
 */
export function goldenMax(f: (x: number) => number, lo: number, hi: number, tol: number): { x: number; value: number } {
  if (!(hi >= lo)) throw new RangeError('invalid bracket');
  let a = lo;
  let b = hi;
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  while (b - a > tol) {
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INV_PHI * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INV_PHI * (b - a);
      fd = f(d);
    }
  }
  const fa = f(lo);
  const fb = f(hi);
  let x = fc >= fd ? c : d;
  let value = Math.max(fc, fd);
  // The bracket ends may hold the maximum when f is monotonic on it.
  if (fa > value) [x, value] = [lo, fa];
  if (fb > value) [x, value] = [hi, fb];
  return { x, value };
}
