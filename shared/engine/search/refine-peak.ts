import { HALF_PI } from '../constants.ts';

const DIRS = [1, 0, -1, 0, 0, 1, 0, -1, 1, 1, 1, -1, -1, 1, -1, -1];
// 1e-6 rad is 6e-5°: far inside the 0.1° peak accuracy, and the power error is second order.
const MIN_STEP_RAD = 1e-6;
const MAX_MOVES = 2000;

/**
 * Local maximum of f(az, el) over the front-hemisphere box [-π/2, π/2]² by compass search
 * (Torczon's pattern search with halving steps): robust at the box edges, where a beam may sit on the horizon.
 */
export function refinePeak(
  f: (azRad: number, elRad: number) => number,
  azRad: number,
  elRad: number,
  stepRad: number,
): { azRad: number; elRad: number; power: number } {
  let az = azRad;
  let el = elRad;
  let best = f(az, el);
  let step = stepRad;
  let moves = 0;
  while (step > MIN_STEP_RAD && moves < MAX_MOVES) {
    let bestAz = az;
    let bestEl = el;
    let bestValue = best;
    for (let d = 0; d < DIRS.length; d += 2) {
      const a = Math.max(-HALF_PI, Math.min(HALF_PI, az + DIRS[d]! * step));
      const e = Math.max(-HALF_PI, Math.min(HALF_PI, el + DIRS[d + 1]! * step));
      const value = f(a, e);
      if (value > bestValue) {
        bestValue = value;
        bestAz = a;
        bestEl = e;
      }
    }
    if (bestValue > best) {
      az = bestAz;
      el = bestEl;
      best = bestValue;
      moves++;
    } else {
      step /= 2;
    }
  }
  return { azRad: az, elRad: el, power: best };
}
