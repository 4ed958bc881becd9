import type { ArrayModel } from '../array/array-model.ts';
import { patternPower } from '../array/array-power.ts';
import { angleBetweenRad, azElOf, directionOf, type Direction } from '../units/direction.ts';
import { gridCandidates } from './grid-candidates.ts';
import { gridStep } from './grid-step.ts';
import { refinePeak } from './refine-peak.ts';
import { ridgePeak } from './ridge-peak.ts';
import { TIE_RATIO } from './tie.ts';

export interface Peak {
  azRad: number;
  elRad: number;
  power: number;
}

/**
 * Maximum of P over the front hemisphere: u-v grid local maxima, each refined by local search;
 * ties go to the maximum nearest the intended direction.
 */
export function findPeak(model: ArrayModel, intended: Direction): Peak {
  const f = (az: number, el: number): number => patternPower(model, az, el);
  const hu = gridStep(model.nx, model.kdx / (2 * Math.PI));
  const hv = gridStep(model.ny, model.kdy / (2 * Math.PI));
  const ridge = ridgePeak(model, intended, model.nx > 1 ? hu : hv);
  if (ridge) {
    const { azRad, elRad } = azElOf(ridge.u, ridge.v);
    return { azRad, elRad, power: f(azRad, elRad) };
  }
  const nu = Math.ceil(2 / hu) + 1;
  const nv = Math.ceil(2 / hv) + 1;
  const startStep = Math.max(2 / (nu - 1), 2 / (nv - 1)) / 2;
  let best: (Peak & { dist: number }) | null = null;
  for (const c of gridCandidates(model, nu, nv)) {
    const start = azElOf(c.u, c.v);
    const r = refinePeak(f, start.azRad, start.elRad, startStep);
    const dist = angleBetweenRad(directionOf(r.azRad, r.elRad), intended);
    if (best === null) {
      best = { ...r, dist };
      continue;
    }
    const tie = Math.abs(r.power - best.power) <= TIE_RATIO * Math.max(r.power, best.power);
    if ((tie && dist < best.dist) || (!tie && r.power > best.power)) best = { ...r, dist };
  }
  if (best === null) {
    // No power anywhere in front (cannot happen for valid tapers): report the intended direction.
    const { azRad, elRad } = azElOf(intended.u, intended.v);
    return { azRad, elRad, power: f(azRad, elRad) };
  }
  return { azRad: best.azRad, elRad: best.elRad, power: best.power };
}
