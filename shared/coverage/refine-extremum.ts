/** Angular box a search stays in (radians); on the sphere azimuth wraps instead of stopping. */
export interface SearchBox {
  azMinRad: number;
  azMaxRad: number;
  elMinRad: number;
  elMaxRad: number;
  wrapAz: boolean;
}

export interface Extremum {
  azRad: number;
  elRad: number;
  value: number;
}

const TOL_RAD = 2e-5;

function wrap(azRad: number): number {
  return azRad > Math.PI ? azRad - 2 * Math.PI : azRad < -Math.PI ? azRad + 2 * Math.PI : azRad;
}

/**
 * Local maximum (sense 1) or minimum (sense −1) of f(az, el) near a start point by a shrinking 5 × 5
 * pattern search: evaluate a ±h square around the best point, move there, halve h. Needs no derivative,
 * so it also walks along the creases where two beams meet (the dips of a best-beam field).
 */
export function refineExtremum(
  f: (azRad: number, elRad: number) => number,
  start: { azRad: number; elRad: number },
  halfWidthRad: number,
  box: SearchBox,
  sense: 1 | -1,
): Extremum {
  if (!(halfWidthRad > 0)) throw new RangeError('invalid halfWidthRad');
  let best: Extremum = { azRad: start.azRad, elRad: start.elRad, value: f(start.azRad, start.elRad) };
  for (let h = halfWidthRad; h > TOL_RAD; h *= 0.5) {
    const c = best;
    for (let i = -2; i <= 2; i++) {
      for (let j = -2; j <= 2; j++) {
        if (i === 0 && j === 0) continue;
        let az = c.azRad + (i * h) / 2;
        az = box.wrapAz ? wrap(az) : Math.min(box.azMaxRad, Math.max(box.azMinRad, az));
        const el = Math.min(box.elMaxRad, Math.max(box.elMinRad, c.elRad + (j * h) / 2));
        const value = f(az, el);
        if (sense * (value - best.value) > 0) best = { azRad: az, elRad: el, value };
      }
    }
  }
  return best;
}
