/** Taper (aperture) efficiency in dB of real weights, 10·log10((Σw)² / (N·Σw²)). */
export function taperEfficiencyDb(weights: ArrayLike<number>): number {
  let sum = 0;
  let sumSq = 0;
  for (let i = 0; i < weights.length; i++) {
    const w = weights[i]!;
    sum += w;
    sumSq += w * w;
  }
  if (weights.length === 0 || sumSq === 0) throw new RangeError('invalid weights');
  return 10 * Math.log10((sum * sum) / (weights.length * sumSq));
}
