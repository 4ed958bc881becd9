/** Symmetric N-point Hamming window, w[m] = 0.54 - 0.46·cos(2πm/(N-1)) (Harris 1978, eq. 30b). */
export function hamming(n: number): Float64Array {
  if (!Number.isInteger(n) || n < 1) throw new RangeError('invalid n');
  const w = new Float64Array(n);
  if (n === 1) return w.fill(1);
  for (let m = 0; m < n; m++) w[m] = 0.54 - 0.46 * Math.cos((2 * Math.PI * m) / (n - 1));
  return w;
}
