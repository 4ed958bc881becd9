/** Summary of one Monte Carlo metric: moments, percentiles (R-7, as d3.quantile) and a histogram. */
export interface Distribution {
  count: number;
  mean: number;
  std: number;
  min: number;
  max: number;
  percentiles: { p: number; value: number }[];
  histogram: { edges: number[]; counts: number[] };
}

export const PERCENTILES = [1, 5, 10, 50, 90, 95, 99];

/** R-7 quantile of sorted values (linear between order statistics; Hyndman & Fan 1996, definition 7). */
export function quantileSorted(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!);
}

/** Distribution of finite values (NaN and ±Infinity skipped); bins: Sturges' rule, at least 5. */
export function distribution(values: readonly number[], bins?: number): Distribution {
  const xs = values.filter(Number.isFinite).sort((a, b) => a - b);
  const count = xs.length;
  if (count === 0) return { count, mean: NaN, std: NaN, min: NaN, max: NaN, percentiles: [], histogram: { edges: [], counts: [] } };
  const mean = xs.reduce((s, x) => s + x, 0) / count;
  const std = count > 1 ? Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (count - 1)) : 0;
  const min = xs[0]!;
  const max = xs[count - 1]!;
  const k = bins ?? Math.max(5, Math.ceil(Math.log2(count)) + 1);
  const width = max > min ? (max - min) / k : 1;
  const edges = Array.from({ length: k + 1 }, (_, i) => min + i * width);
  const counts = new Array<number>(k).fill(0);
  for (const x of xs) counts[Math.min(k - 1, Math.floor((x - min) / width))]!++;
  return {
    count,
    mean,
    std,
    min,
    max,
    percentiles: PERCENTILES.map((p) => ({ p, value: quantileSorted(xs, p / 100) })),
    histogram: { edges, counts },
  };
}
