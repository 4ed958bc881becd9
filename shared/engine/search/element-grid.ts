import type { ElementPower } from '../element/element-power.ts';
import { createMemo } from '../util/memo.ts';

const memo = createMemo<Float64Array>(32);

/**
 * Element power on an nu×nv grid of (u, v) over [-1, 1]², u fastest; -1 marks points outside the
 * visible disk. Memoised: every point of a sweep with the same element and grid shares it.
 */
export function elementGrid(element: ElementPower, elementKey: string, nu: number, nv: number): Float64Array {
  return memo.get(`${elementKey}|${nu}|${nv}`, () => {
    const out = new Float64Array(nu * nv);
    for (let j = 0; j < nv; j++) {
      const v = -1 + (2 * j) / (nv - 1);
      for (let i = 0; i < nu; i++) {
        const u = -1 + (2 * i) / (nu - 1);
        const w2 = 1 - u * u - v * v;
        out[j * nu + i] = w2 < 0 ? -1 : element(Math.atan2(u, Math.sqrt(w2)), Math.asin(v));
      }
    }
    return out;
  });
}
