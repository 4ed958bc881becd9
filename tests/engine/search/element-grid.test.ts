import { describe, expect, it } from 'vitest';
import { elementPower } from '../../../shared/engine/element/element-power.ts';
import { elementGrid } from '../../../shared/engine/search/element-grid.ts';

describe('elementGrid(element, key, nu, nv) samples the element over the u-v disk', () => {
  // In u-v space the angle from broadside has cos θ = w = √(1 − u² − v²) (README conventions), so a cos² θ
  // element is 1 − u² − v² there.
  it('a cos² θ element is 1 − u² − v² inside the visible disk and −1 outside it (±1e-12)', () => {
    const g = elementGrid(elementPower({ kind: 'cosine', q: 2 }), 'test-cos2', 21, 21);
    const at = (i: number, j: number) => g[j * 21 + i]!;
    const uv = (i: number) => -1 + (2 * i) / 20;
    for (const [i, j] of [[10, 10], [14, 7], [3, 12]] as const) {
      expect(at(i, j)).toBeCloseTo(1 - uv(i) ** 2 - uv(j) ** 2, 12);
    }
    expect(at(0, 0)).toBe(-1);
    expect(at(20, 19)).toBe(-1);
  });
});
