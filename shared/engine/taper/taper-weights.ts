import type { Taper } from '../../schemas/design.ts';
import { createMemo } from '../util/memo.ts';
import { chebyshev } from './chebyshev.ts';
import { hamming } from './hamming.ts';
import { hann } from './hann.ts';
import { taylor } from './taylor.ts';

const memo = createMemo<Float64Array>(256);

function compute(taper: Taper, n: number): Float64Array {
  switch (taper.kind) {
    case 'uniform':
      return new Float64Array(n).fill(1);
    case 'hann':
      return hann(n);
    case 'hamming':
      return hamming(n);
    case 'taylor':
      return taylor(n, taper.nbar, taper.sllDb);
    case 'chebyshev':
      return chebyshev(n, taper.sllDb);
  }
}

/**
 * Amplitude weights of an n-element axis, normalised to a peak of 1; an axis of one element has weight 1.
 * Memoised by (taper, n): the returned array is shared, never write to it.
 */
export function taperWeights(taper: Taper, n: number): Float64Array {
  if (!Number.isInteger(n) || n < 1) throw new RangeError('invalid n');
  return memo.get(`${JSON.stringify(taper)}|${n}`, () => {
    if (n === 1) return new Float64Array([1]);
    const w = compute(taper, n);
    let peak = 0;
    for (const x of w) peak = Math.max(peak, x);
    if (!(peak > 0)) throw new RangeError('invalid taper: all weights zero');
    for (let m = 0; m < n; m++) w[m] = w[m]! / peak;
    return w;
  });
}
