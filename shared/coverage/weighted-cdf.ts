/**
 * The solid-angle CDF of a sampled field: levels sorted ascending with each sample's weight. A sample's
 * weight is spread evenly around its level, so the CDF passes through the middle of each sample's mass
 * and is linear in dB between neighbours (the midpoint rule behind the grid, carried to the quantiles).
 */
export interface WeightedCdf {
  /** Positive levels (mW), ascending. */
  levelsMw: Float64Array;
  /** Fraction of the region at each level's mid-mass, ascending in (0, 1). */
  midFraction: Float64Array;
  /** Fraction of the region no module radiates into (level 0, −∞ dBm). */
  darkFraction: number;
}

export function weightedCdf(valuesMw: Float64Array, weights: Float64Array): WeightedCdf {
  if (valuesMw.length !== weights.length) throw new RangeError('invalid weights');
  let total = 0;
  let dark = 0;
  let lit = 0;
  for (let i = 0; i < valuesMw.length; i++) {
    total += weights[i]!;
    if (valuesMw[i]! > 0) lit++;
    else dark += weights[i]!;
  }
  if (!(total > 0)) throw new RangeError('invalid weights');
  const order = new Uint32Array(lit);
  for (let i = 0, k = 0; i < valuesMw.length; i++) if (valuesMw[i]! > 0) order[k++] = i;
  order.sort((a, b) => valuesMw[a]! - valuesMw[b]!);
  const levelsMw = new Float64Array(lit);
  const midFraction = new Float64Array(lit);
  let cum = dark;
  for (let k = 0; k < lit; k++) {
    const i = order[k]!;
    levelsMw[k] = valuesMw[i]!;
    midFraction[k] = (cum + weights[i]! / 2) / total;
    cum += weights[i]!;
  }
  return { levelsMw, midFraction, darkFraction: dark / total };
}

/** Level x (dBm) with the given fraction of the region at or below it; null when that part gets nothing. */
export function cdfQuantileDbm(cdf: WeightedCdf, fraction: number): number | null {
  const { levelsMw, midFraction } = cdf;
  const n = levelsMw.length;
  if (n === 0 || (cdf.darkFraction > 0 && fraction <= cdf.darkFraction)) return null;
  const db = (k: number) => 10 * Math.log10(levelsMw[k]!);
  if (fraction <= midFraction[0]!) return db(0);
  if (fraction >= midFraction[n - 1]!) return db(n - 1);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (midFraction[mid]! <= fraction) lo = mid;
    else hi = mid;
  }
  const t = (fraction - midFraction[lo]!) / (midFraction[hi]! - midFraction[lo]!);
  return db(lo) + t * (db(hi) - db(lo));
}
