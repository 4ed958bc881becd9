import type { ArrayModel } from '../array/array-model.ts';
import { createMemo } from '../util/memo.ts';
import { cutAngle } from './cut-samples.ts';

const sines = createMemo<Float64Array>(16);
const cosines = createMemo<Float64Array>(16);
const factors = createMemo<Float64Array>(32);

/** sin of every angle of a cut of `count` samples (shared, read-only). */
export function cutSines(count: number): Float64Array {
  return sines.get(String(count), () => {
    const out = new Float64Array(count);
    for (let i = 0; i < count; i++) out[i] = Math.sin(cutAngle(i, count));
    return out;
  });
}

/** cos of every angle of a cut of `count` samples (shared, read-only). */
export function cutCosines(count: number): Float64Array {
  return cosines.get(String(count), () => {
    const out = new Float64Array(count);
    for (let i = 0; i < count; i++) out[i] = Math.cos(cutAngle(i, count));
    return out;
  });
}

/**
 * Element power at every sample of a cut: plane 'az' varies az at el = fixedRad, 'el' varies el at
 * az = fixedRad. A separable element reuses one memoised factor table per cut size; written into out.
 */
export function elementCutSamples(model: ArrayModel, plane: 'az' | 'el', fixedRad: number, count: number, out: Float64Array): void {
  const f = model.elementFactors;
  if (f) {
    const table = factors.get(`${model.elementKey}|${plane}|${count}`, () => {
      const t = new Float64Array(count);
      const g = plane === 'az' ? f.az : f.el;
      for (let i = 0; i < count; i++) t[i] = g(cutAngle(i, count));
      return t;
    });
    const k = plane === 'az' ? f.el(fixedRad) : f.az(fixedRad);
    for (let i = 0; i < count; i++) out[i] = table[i]! * k;
    return;
  }
  for (let i = 0; i < count; i++) {
    const a = cutAngle(i, count);
    out[i] = plane === 'az' ? model.element(a, fixedRad) : model.element(fixedRad, a);
  }
}
