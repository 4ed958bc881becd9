/**
 * Pareto front of two objectives: the points no other point beats on one objective without losing on the other.
 * Pure and dependency-free so the trade scatter, the summary and the tests share one definition.
 */
export type Sense = 'min' | 'max';

export interface Objective<T> {
  value: (item: T) => number | null | undefined;
  sense: Sense;
}

/**
 * Indices (into `items`) of the non-dominated items, ordered along the first objective from best to worst.
 * Items whose value is null, undefined or not finite on either objective are skipped.
 * Identical items do not dominate each other, so duplicates on the front are all kept.
 * O(n log n): sort by the first objective, then sweep keeping the best second objective seen so far.
 */
export function paretoFront<T>(items: readonly T[], first: Objective<T>, second: Objective<T>): number[] {
  const sa = first.sense === 'min' ? 1 : -1;
  const sb = second.sense === 'min' ? 1 : -1;
  const pts: { i: number; a: number; b: number }[] = [];
  items.forEach((item, i) => {
    const a = first.value(item);
    const b = second.value(item);
    if (a == null || b == null || !Number.isFinite(a) || !Number.isFinite(b)) return;
    // Both objectives become "smaller is better" from here on.
    pts.push({ i, a: sa * a, b: sb * b });
  });
  pts.sort((p, q) => p.a - q.a || p.b - q.b || p.i - q.i);

  const front: number[] = [];
  let bestB = Infinity;
  let k = 0;
  while (k < pts.length) {
    const groupA = pts[k]!.a;
    const groupMinB = pts[k]!.b;
    // Within one value of the first objective only the smallest second objective can survive,
    // and only if every item with a strictly better first objective is worse on the second.
    while (k < pts.length && pts[k]!.a === groupA) {
      const p = pts[k]!;
      if (p.b === groupMinB && p.b < bestB) front.push(p.i);
      k++;
    }
    bestB = Math.min(bestB, groupMinB);
  }
  return front;
}

/** True when `p` is at least as good as `q` on both objectives and strictly better on one. */
export function dominates<T>(p: T, q: T, first: Objective<T>, second: Objective<T>): boolean {
  const better = (o: Objective<T>, x: T, y: T): number => {
    const vx = o.value(x);
    const vy = o.value(y);
    if (vx == null || vy == null) return NaN;
    return o.sense === 'min' ? vy - vx : vx - vy;
  };
  const da = better(first, p, q);
  const db = better(second, p, q);
  if (Number.isNaN(da) || Number.isNaN(db)) return false;
  return da >= 0 && db >= 0 && (da > 0 || db > 0);
}
