import { describe, expect, it } from 'vitest';
import { dominates, paretoFront, type Objective } from '../../shared/trade/pareto.ts';

type P = { x: number | null; y: number | null };
const minX: Objective<P> = { value: (p) => p.x, sense: 'min' };
const minY: Objective<P> = { value: (p) => p.y, sense: 'min' };
const maxY: Objective<P> = { value: (p) => p.y, sense: 'max' };

/** The textbook definition, O(n²): kept when no other item dominates it. */
function bruteForce(items: P[], a: Objective<P>, b: Objective<P>): number[] {
  const ok = (p: P) => Number.isFinite(a.value(p) ?? NaN) && Number.isFinite(b.value(p) ?? NaN);
  return items
    .map((p, i) => ({ p, i }))
    .filter(({ p }) => ok(p) && !items.some((q) => ok(q) && dominates(q, p, a, b)))
    .map(({ i }) => i);
}

/** Small deterministic generator (mulberry32) so a failure reproduces. */
function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('paretoFront(items, first, second)', () => {
  it('keeps the staircase of a hand-drawn example (both minimised)', () => {
    const items: P[] = [
      { x: 1, y: 5 }, // front
      { x: 2, y: 3 }, // front
      { x: 3, y: 4 }, // dominated by (2,3)
      { x: 4, y: 1 }, // front
      { x: 5, y: 1 }, // dominated by (4,1): same y, larger x
    ];
    expect(paretoFront(items, minX, minY)).toEqual([0, 1, 3]);
  });

  it('honours "max" for the second objective', () => {
    const items: P[] = [
      { x: 1, y: 1 },
      { x: 2, y: 3 },
      { x: 3, y: 2 },
    ];
    // Fewer x and more y is better: (1,1) and (2,3) survive, (3,2) loses to (2,3).
    expect(paretoFront(items, minX, maxY)).toEqual([0, 1]);
  });

  it('keeps exact duplicates on the front and drops a tie on the first objective with a worse second', () => {
    const items: P[] = [
      { x: 1, y: 2 },
      { x: 1, y: 2 },
      { x: 1, y: 3 },
    ];
    expect(paretoFront(items, minX, minY)).toEqual([0, 1]);
  });

  it('skips items with null or non-finite values', () => {
    const items: P[] = [
      { x: null, y: 0 },
      { x: 0, y: Number.NaN },
      { x: 5, y: 5 },
      { x: Number.POSITIVE_INFINITY, y: -100 },
    ];
    expect(paretoFront(items, minX, minY)).toEqual([2]);
  });

  it('returns an empty list for no items', () => {
    expect(paretoFront([], minX, minY)).toEqual([]);
  });

  it('matches the O(n²) definition on 50 random clouds, with ties from coarse rounding', () => {
    const r = rng(20240611);
    for (let trial = 0; trial < 50; trial++) {
      const n = 1 + Math.floor(r() * 200);
      const items: P[] = Array.from({ length: n }, () => ({ x: Math.round(r() * 20), y: Math.round(r() * 20) }));
      const senses = [minY, maxY];
      const second = senses[trial % 2]!;
      const fast = [...paretoFront(items, minX, second)].sort((a, b) => a - b);
      expect(fast).toEqual(bruteForce(items, minX, second));
    }
  });

  it('orders the front from best to worst on the first objective', () => {
    const items: P[] = [
      { x: 4, y: 1 },
      { x: 1, y: 5 },
      { x: 2, y: 3 },
    ];
    expect(paretoFront(items, minX, minY)).toEqual([1, 2, 0]);
  });
});

describe('dominates(p, q, first, second)', () => {
  it('needs strictly better on at least one objective', () => {
    expect(dominates({ x: 1, y: 1 }, { x: 1, y: 1 }, minX, minY)).toBe(false);
    expect(dominates({ x: 1, y: 1 }, { x: 1, y: 2 }, minX, minY)).toBe(true);
    expect(dominates({ x: 1, y: 3 }, { x: 2, y: 2 }, minX, minY)).toBe(false);
  });
});
