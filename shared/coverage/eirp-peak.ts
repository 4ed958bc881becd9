import { RAD_PER_DEG } from '../engine/constants.ts';
import type { Beam } from '../schemas/coverage.ts';
import type { DeviceEirp, Serving } from './device-eirp.ts';
import { deviceVectorOf } from './module-angles.ts';
import { refineExtremum, type Extremum, type SearchBox } from './refine-extremum.ts';
import type { RegionGrid } from './region-grid.ts';
import type { RegionSamples } from './sample-region.ts';
import { cellStart, extremeCells, searchBox } from './search-box.ts';

/** Grid cells the peak search starts from, besides each beam's own steer. */
const PEAK_SEEDS = 4;

function inBox(box: SearchBox, azRad: number, elRad: number): boolean {
  const eps = 1e-12;
  return elRad >= box.elMinRad - eps && elRad <= box.elMaxRad + eps && (box.wrapAz || (azRad >= box.azMinRad - eps && azRad <= box.azMaxRad + eps));
}

/**
 * Peak of the best-beam field over the region: the grid's best cells and every beam's steer direction
 * (in the device frame, when inside the region) seed a local search, so the peak does not depend on the grid step.
 */
export function eirpPeak(eirp: DeviceEirp, beams: readonly (readonly Beam[])[], grid: RegionGrid, samples: RegionSamples): Extremum {
  const box = searchBox(grid);
  const serving: Serving = { module: -1, beam: -1 };
  const f = (az: number, el: number) => eirp.at(az, el, serving);
  const h = 1.5 * Math.max(grid.azStepDeg, grid.elStepDeg) * RAD_PER_DEG;
  const cells = extremeCells(samples.eirpMw, PEAK_SEEDS, 1);
  const starts = cells.map((k) => cellStart(grid, k));
  beams.forEach((list, i) => {
    const frame = eirp.modules[i]!.frame;
    for (const b of list) {
      const d = deviceVectorOf(frame, b.azDeg * RAD_PER_DEG, b.elDeg * RAD_PER_DEG);
      const s = { azRad: Math.atan2(d[0], d[2]), elRad: Math.asin(Math.max(-1, Math.min(1, d[1]))) };
      if (inBox(box, s.azRad, s.elRad)) starts.push(s);
    }
  });
  let peak: Extremum = { ...cellStart(grid, cells[0]!), value: samples.eirpMw[cells[0]!]! };
  for (const s of starts) {
    const r = refineExtremum(f, s, h, box, 1);
    if (r.value > peak.value) peak = r;
  }
  return peak;
}
