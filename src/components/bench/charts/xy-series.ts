/** A named line of (x, y) points for the bench charts; dashed lines mark model series beside measured ones. */
export interface XySeries {
  name: string;
  points: { x: number; y: number }[];
  dashed?: boolean;
  markers?: boolean;
}

export const BENCH_COLOURS = ['#1d7a74', '#b3472f', '#f2b441', '#123f45', '#5fb3a9', '#8a5a9e'];

/** [min, max] of finite values with a little room, or [0, 1] when there is nothing to show. */
export function paddedDomain(values: number[], pad = 0.05): [number, number] {
  const xs = values.filter(Number.isFinite);
  if (xs.length === 0) return [0, 1];
  const lo = Math.min(...xs);
  const hi = Math.max(...xs);
  const span = hi - lo || Math.abs(hi) || 1;
  return [lo - pad * span, hi + pad * span];
}
