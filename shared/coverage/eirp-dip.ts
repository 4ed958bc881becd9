import { RAD_PER_DEG } from '../engine/constants.ts';
import { beamSubset } from './beam-subset.ts';
import type { DeviceEirp, Serving } from './device-eirp.ts';
import { refineExtremum, type Extremum } from './refine-extremum.ts';
import type { RegionGrid } from './region-grid.ts';
import type { RegionSamples } from './sample-region.ts';
import { cellStart, extremeCells, searchBox } from './search-box.ts';

/** Grid cells the dip search starts from: dips between beams are shallow and many, so try several. */
const DIP_SEEDS = 8;

/** The (module, beam) pairs serving cell k and its eight neighbours (azimuth wrapping on the sphere). */
function neighbourBeams(grid: RegionGrid, samples: RegionSamples, k: number, wrapAz: boolean): [number, number][] {
  const nAz = grid.azDeg.length;
  const nEl = grid.elDeg.length;
  const i0 = k % nAz;
  const j0 = Math.floor(k / nAz);
  const seen = new Map<string, [number, number]>();
  for (let dj = -1; dj <= 1; dj++) {
    for (let di = -1; di <= 1; di++) {
      const j = j0 + dj;
      let i = i0 + di;
      if (wrapAz) i = (i + nAz) % nAz;
      if (j < 0 || j >= nEl || i < 0 || i >= nAz) continue;
      const c = j * nAz + i;
      if (samples.module[c]! >= 0) seen.set(`${samples.module[c]}:${samples.beam[c]}`, [samples.module[c]!, samples.beam[c]!]);
    }
  }
  return [...seen.values()];
}

/**
 * Lowest value of the best-beam field over the region (the deepest dip between beams, or an edge): the grid's
 * lowest cells seed a local search over the beams serving around them; the value kept is the whole codebook's
 * at the point found, so it is a true value of the field. Value 0 (no module radiates there) is returned as found.
 */
export function eirpDip(eirp: DeviceEirp, grid: RegionGrid, samples: RegionSamples): Extremum {
  const box = searchBox(grid);
  const serving: Serving = { module: -1, beam: -1 };
  const h = 1.5 * Math.max(grid.azStepDeg, grid.elStepDeg) * RAD_PER_DEG;
  const lows = extremeCells(samples.eirpMw, DIP_SEEDS, -1);
  let dip: Extremum = { ...cellStart(grid, lows[0]!), value: samples.eirpMw[lows[0]!]! };
  if (dip.value <= 0) return dip;
  for (const k of lows) {
    const r = refineExtremum(beamSubset(eirp, neighbourBeams(grid, samples, k, box.wrapAz)), cellStart(grid, k), h, box, -1);
    const value = eirp.at(r.azRad, r.elRad, serving);
    if (value < dip.value) dip = { ...r, value };
  }
  return dip;
}
