import type { ArrayModel } from '../array/array-model.ts';
import { arrayPower, patternPower } from '../array/array-power.ts';
import { collapseRows } from '../array/collapse-rows.ts';
import { linePower } from '../array/line-power.ts';
import type { Peak } from '../search/find-peak.ts';
import { cutStepRad } from '../search/grid-step.ts';
import { cutMetrics, type CutMetrics } from './cut-metrics.ts';
import { cutSampleCount } from './cut-samples.ts';
import { cutCosines, cutSines, elementCutSamples } from './cut-tables.ts';

let scratch = new Float64Array(0);

/** The az cut (el = peak el) and the el cut (az = peak az) through the peak, measured. */
export function beamCuts(model: ArrayModel, peak: Peak): { az: CutMetrics; el: CutMetrics } {
  const { nx, ny, element } = model;
  const el0 = peak.elRad;
  const az0 = peak.azRad;
  const cosEl0 = Math.cos(el0);
  const sinAz0 = Math.sin(az0);
  // At fixed el the y sum is a constant: fold it into the line weights once.
  let re = model.xRe;
  let im = model.xIm;
  let scale = 1;
  if (model.separable) scale = linePower(model.yRe, model.yIm, ny, model.kdy, Math.sin(el0));
  else {
    re = new Float64Array(nx);
    im = new Float64Array(nx);
    collapseRows(model, Math.sin(el0), re, im);
  }
  const fAz = (az: number): number => linePower(re, im, nx, model.kdx, Math.sin(az) * cosEl0) * scale * element(az, el0);
  const fEl = (el: number): number => patternPower(model, az0, el);
  const lx = (nx * model.kdx) / (2 * Math.PI);
  const ly = (ny * model.kdy) / (2 * Math.PI);

  const nAz = cutSampleCount(cutStepRad(lx));
  const nEl = cutSampleCount(cutStepRad(Math.max(ly, lx * Math.abs(sinAz0))));
  if (scratch.length < 2 * (nAz + nEl)) scratch = new Float64Array(2 * (nAz + nEl));
  const sAz = scratch.subarray(0, nAz);
  const sEl = scratch.subarray(nAz, nAz + nEl);
  const e = scratch.subarray(nAz + nEl, nAz + nEl + Math.max(nAz, nEl));
  // Samples from shared sine and element tables: no trig for the element per sample.
  elementCutSamples(model, 'az', el0, nAz, e);
  let sin = cutSines(nAz);
  for (let i = 0; i < nAz; i++) sAz[i] = linePower(re, im, nx, model.kdx, sin[i]! * cosEl0) * scale * e[i]!;
  elementCutSamples(model, 'el', az0, nEl, e);
  sin = cutSines(nEl);
  const cos = cutCosines(nEl);
  for (let i = 0; i < nEl; i++) sEl[i] = arrayPower(model, sinAz0 * cos[i]!, sin[i]!) * e[i]!;
  return {
    az: cutMetrics(fAz, sAz, nAz, az0, peak.power),
    el: cutMetrics(fEl, sEl, nEl, el0, peak.power),
  };
}
