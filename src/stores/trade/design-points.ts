/** Part of the trade store: the points (one per steering angle) of a design, fetched once per sweep, and the picked one. */
import { shallowRef, type Ref } from 'vue';
import { sweepsApi } from '@/api/sweeps';
import type { PointResult } from '@shared/sweep/chunk.ts';
import { MAX_PAGE_ROWS } from '@shared/sweep/results-query.ts';

export function useDesignPoints(sweepId: Ref<string | null>) {
  const points = new Map<number, Promise<PointResult[]>>();
  /** The one point whose pattern cuts and u-v map the charts draw. */
  const pickedPoint = shallowRef<PointResult | null>(null);

  function pointsOf(designIndex: number): Promise<PointResult[]> {
    const id = sweepId.value;
    if (!id) return Promise.resolve([]);
    let p = points.get(designIndex);
    if (!p) {
      p = sweepsApi.points(id, { sort: [{ key: 'angleIndex', dir: 'asc' }], ranges: {} }, 0, MAX_PAGE_ROWS, { designIndex }).then((b) => b.rows);
      p.catch(() => points.delete(designIndex));
      points.set(designIndex, p);
    }
    return p;
  }

  /** The point a URL names, fetched with its design's points (nothing when the sweep has no such point). */
  async function restorePoint(at: { designIndex: number; index: number }): Promise<void> {
    const p = (await pointsOf(at.designIndex).catch(() => [])).find((x) => x.index === at.index);
    if (p && sweepId.value) pickedPoint.value = p;
  }

  /** Another sweep was opened: its points are other points. */
  function forget(): void {
    pickedPoint.value = null;
    points.clear();
  }

  return { pickedPoint, pointsOf, restorePoint, forget };
}
