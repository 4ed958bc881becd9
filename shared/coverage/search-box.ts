import { RAD_PER_DEG } from '../engine/constants.ts';
import type { SearchBox } from './refine-extremum.ts';
import type { RegionGrid } from './region-grid.ts';

/** The region's angular box for the local searches; azimuth wraps when the grid spans the full circle. */
export function searchBox(grid: RegionGrid): SearchBox {
  return {
    azMinRad: grid.azMinDeg * RAD_PER_DEG,
    azMaxRad: grid.azMaxDeg * RAD_PER_DEG,
    elMinRad: grid.elMinDeg * RAD_PER_DEG,
    elMaxRad: grid.elMaxDeg * RAD_PER_DEG,
    wrapAz: grid.azMaxDeg - grid.azMinDeg >= 360,
  };
}

/** Cell k (el-major) of a grid as a search start, radians. */
export function cellStart(grid: RegionGrid, k: number): { azRad: number; elRad: number } {
  const nAz = grid.azDeg.length;
  return { azRad: grid.azDeg[k % nAz]! * RAD_PER_DEG, elRad: grid.elDeg[Math.floor(k / nAz)]! * RAD_PER_DEG };
}

/** Indices of the `count` highest (sense 1) or lowest (sense −1) values, best first, in one pass. */
export function extremeCells(values: Float64Array, count: number, sense: 1 | -1): number[] {
  const out: number[] = [];
  for (let k = 0; k < values.length; k++) {
    const v = sense * values[k]!;
    if (out.length === count && v <= sense * values[out[count - 1]!]!) continue;
    let at = out.length;
    while (at > 0 && v > sense * values[out[at - 1]!]!) at--;
    out.splice(at, 0, k);
    if (out.length > count) out.pop();
  }
  return out;
}
