/** Chebyshev polynomial T_order(x) for any real x. */
function chebyshevT(order: number, x: number): number {
  if (Math.abs(x) <= 1) return Math.cos(order * Math.acos(x));
  const magnitude = Math.cosh(order * Math.acosh(Math.abs(x)));
  return x < 0 && order % 2 === 1 ? -magnitude : magnitude;
}

/**
 * Dolph-Chebyshev weights for N elements and a side-lobe ratio in dB.
 * Dolph, Proc. IRE 34 (1946): AF(ψ) = T_{N-1}(x0·cos(ψ/2)), x0 = cosh(acosh(R)/(N-1)); the weights are
 * the N Fourier coefficients of AF, recovered exactly from N samples ψ_k = 2πk/N.
 */
export function chebyshev(n: number, sllDb: number): Float64Array {
  if (!Number.isInteger(n) || n < 1) throw new RangeError('invalid n');
  if (!(sllDb > 0)) throw new RangeError('invalid sllDb');
  const w = new Float64Array(n);
  if (n === 1) return w.fill(1);
  const order = n - 1;
  const x0 = Math.cosh(Math.acosh(10 ** (sllDb / 20)) / order);
  const samples = new Float64Array(n);
  for (let k = 0; k < n; k++) samples[k] = chebyshevT(order, x0 * Math.cos((Math.PI * k) / n));
  let peak = 0;
  for (let m = 0; m < n; m++) {
    let s = 0;
    for (let k = 0; k < n; k++) s += samples[k]! * Math.cos(((m - order / 2) * 2 * Math.PI * k) / n);
    w[m] = s / n;
    peak = Math.max(peak, w[m]!);
  }
  for (let m = 0; m < n; m++) w[m] = w[m]! / peak;
  return w;
}
