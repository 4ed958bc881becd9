import type { ArrayModel } from '../array/array-model.ts';
import { linePower } from '../array/line-power.ts';
import type { Direction } from '../units/direction.ts';
import { goldenMax } from '../util/golden-max.ts';
import { TIE_RATIO } from './tie.ts';

/**
 * Peak of a linear array of flat elements: the pattern depends on one direction cosine only, so the
 * maximum is a cone (a ridge). Find the best cone in 1-D, then take its point nearest the intended direction.
 * Returns null when the array is not such a case.
 */
export function ridgePeak(model: ArrayModel, intended: Direction, step: number): Direction | null {
  if (!model.flatElement || (model.nx > 1 && model.ny > 1)) return null;
  if (model.nx === 1 && model.ny === 1) return intended;
  const alongX = model.nx > 1;
  const re = alongX ? model.xRe : model.yRe;
  const im = alongX ? model.xIm : model.yIm;
  const n = alongX ? model.nx : model.ny;
  const kd = alongX ? model.kdx : model.kdy;
  const f = (s: number): number => linePower(re, im, n, kd, s);
  const target = alongX ? intended.u : intended.v;
  const count = Math.ceil(2 / step) + 1;
  const h = 2 / (count - 1);
  const samples = new Float64Array(count);
  for (let i = 0; i < count; i++) samples[i] = f(-1 + i * h);
  let best = { s: target, power: -1 };
  for (let i = 0; i < count; i++) {
    const s = -1 + i * h;
    const here = samples[i]!;
    if ((i > 0 && samples[i - 1]! > here) || (i < count - 1 && samples[i + 1]! > here)) continue;
    const r = goldenMax(f, Math.max(-1, s - h), Math.min(1, s + h), 1e-10);
    const tie = Math.abs(r.value - best.power) <= TIE_RATIO * Math.max(r.value, best.power);
    if ((tie && Math.abs(r.x - target) < Math.abs(best.s - target)) || (!tie && r.value > best.power)) best = { s: r.x, power: r.value };
  }
  // Point of the cone {s fixed} nearest the intended direction: keep the other two components' ratio.
  const s = best.s;
  const rest = Math.sqrt(Math.max(0, 1 - s * s));
  const other = alongX ? intended.v : intended.u;
  const norm = Math.hypot(other, intended.w);
  const o = norm > 0 ? (other / norm) * rest : 0;
  const w = norm > 0 ? (intended.w / norm) * rest : rest;
  return alongX ? { u: s, v: o, w } : { u: o, v: s, w };
}
