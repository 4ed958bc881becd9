import { RAD_PER_DEG } from '../engine/constants.ts';
import type { DeviceEirp, Serving } from './device-eirp.ts';
import type { RegionGrid } from './region-grid.ts';

/** The best-beam field at every cell centre of a grid (el-major), with each cell's solid angle. */
export interface RegionSamples {
  eirpMw: Float64Array;
  weightSr: Float64Array;
  module: Int8Array;
  beam: Int16Array;
}

/** `onRow(done, total)` after each elevation row, for a progress bar. */
export function sampleRegion(eirp: DeviceEirp, grid: RegionGrid, onRow?: (done: number, total: number) => void): RegionSamples {
  const nAz = grid.azDeg.length;
  const nEl = grid.elDeg.length;
  const eirpMw = new Float64Array(nAz * nEl);
  const weightSr = new Float64Array(nAz * nEl);
  const module = new Int8Array(nAz * nEl);
  const beam = new Int16Array(nAz * nEl);
  const serving: Serving = { module: -1, beam: -1 };
  for (let j = 0; j < nEl; j++) {
    const el = grid.elDeg[j]! * RAD_PER_DEG;
    const w = grid.rowSolidAngleSr[j]!;
    for (let i = 0; i < nAz; i++) {
      const k = j * nAz + i;
      eirpMw[k] = eirp.at(grid.azDeg[i]! * RAD_PER_DEG, el, serving);
      weightSr[k] = w;
      module[k] = serving.module;
      beam[k] = serving.beam;
    }
    onRow?.(j + 1, nEl);
  }
  return { eirpMw, weightSr, module, beam };
}
