import { RAD_PER_DEG } from '../engine/constants.ts';
import type { Beam } from '../schemas/coverage.ts';
import type { DeviceEirp } from './device-eirp.ts';
import { deviceAngles, moduleAngles, type ModuleAngles } from './module-angles.ts';
import { refineExtremum, type Extremum, type SearchBox } from './refine-extremum.ts';
import type { RegionGrid } from './region-grid.ts';
import type { RegionSamples } from './sample-region.ts';
import { cellStart, searchBox } from './search-box.ts';
import { deviceDirection } from './device-direction.ts';

function inBox(box: SearchBox, azRad: number, elRad: number): boolean {
  const eps = 1e-12;
  return elRad >= box.elMinRad - eps && elRad <= box.elMaxRad + eps && (box.wrapAz || (azRad >= box.azMinRad - eps && azRad <= box.azMaxRad + eps));
}

/**
 * Peak of the best-beam field over the region. The max over directions of a max over beams is the max over
 * beams of each beam's own peak in the region, so each beam is searched alone (one gain per evaluation):
 * from its steer direction when that lies in the region, and from the best grid cell it serves.
 */
export function eirpPeak(eirp: DeviceEirp, beams: readonly (readonly Beam[])[], grid: RegionGrid, samples: RegionSamples): Extremum {
  const box = searchBox(grid);
  const h = 1.5 * Math.max(grid.azStepDeg, grid.elStepDeg) * RAD_PER_DEG;
  const bestCell = new Map<number, number>();
  const key = (m: number, b: number) => m * 1024 + b;
  for (let k = 0; k < samples.eirpMw.length; k++) {
    if (samples.module[k]! < 0) continue;
    const id = key(samples.module[k]!, samples.beam[k]!);
    const at = bestCell.get(id);
    if (at === undefined || samples.eirpMw[k]! > samples.eirpMw[at]!) bestCell.set(id, k);
  }
  let first = 0;
  for (let k = 1; k < samples.eirpMw.length; k++) if (samples.eirpMw[k]! > samples.eirpMw[first]!) first = k;
  let peak: Extremum = { ...cellStart(grid, first), value: samples.eirpMw[first]! };
  const angles: ModuleAngles = { azRad: 0, elRad: 0 };
  eirp.modules.forEach((placed, i) => {
    const mw = 10 ** (placed.conductedPowerDbm / 10);
    placed.beams.forEach((gain, j) => {
      const f = (az: number, el: number) => mw * gain(moduleAngles(placed.frame, deviceDirection(az, el), angles).azRad, angles.elRad);
      const b = beams[i]![j]!;
      const starts = [deviceAngles(placed.frame, b.azDeg * RAD_PER_DEG, b.elDeg * RAD_PER_DEG)].filter((s) => inBox(box, s.azRad, s.elRad));
      const cell = bestCell.get(key(i, j));
      if (cell !== undefined) starts.push(cellStart(grid, cell));
      for (const s of starts) {
        const r = refineExtremum(f, s, h, box, 1);
        if (r.value > peak.value) peak = r;
      }
    });
  });
  return peak;
}
