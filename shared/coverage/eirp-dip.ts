import { RAD_PER_DEG } from '../engine/constants.ts';
import type { DeviceEirp, Serving } from './device-eirp.ts';
import { refineExtremum, type Extremum } from './refine-extremum.ts';
import type { RegionGrid } from './region-grid.ts';
import type { RegionSamples } from './sample-region.ts';
import { cellStart, extremeCells, searchBox } from './search-box.ts';

/** Grid cells the dip search starts from: dips between beams are shallow and many, so try several. */
const DIP_SEEDS = 8;

/**
 * Lowest value of the best-beam field over the region (the deepest dip between beams, or an edge): the
 * grid's lowest cells seed a local search. Value 0 (no module radiates there) is returned as found.
 */
export function eirpDip(eirp: DeviceEirp, grid: RegionGrid, samples: RegionSamples): Extremum {
  const box = searchBox(grid);
  const serving: Serving = { module: -1, beam: -1 };
  const f = (az: number, el: number) => eirp.at(az, el, serving);
  const h = 1.5 * Math.max(grid.azStepDeg, grid.elStepDeg) * RAD_PER_DEG;
  const lows = extremeCells(samples.eirpMw, DIP_SEEDS, -1);
  let dip: Extremum = { ...cellStart(grid, lows[0]!), value: samples.eirpMw[lows[0]!]! };
  if (dip.value <= 0) return dip;
  for (const k of lows) {
    const r = refineExtremum(f, cellStart(grid, k), h, box, -1);
    if (r.value < dip.value) dip = r;
  }
  return dip;
}
